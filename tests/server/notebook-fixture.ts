/** A notebook entry (a 1095 coupon, brine-quenched, tempered twice) created through the API for upload tests. */
import { expect } from "vitest";
import type { Agent } from "supertest";
import type { NotebookEntryResponse } from "../../shared/api/notebook";

export async function newCouponEntry(s: { agent: Agent; csrfToken: string }, title = "Test coupon"): Promise<number> {
  const res = await s.agent.post("/api/notebook/entries").set("x-csrf-token", s.csrfToken).send({
    title,
    workedOn: "2026-02-01",
    steel: "grade:1095",
    normalizingCycles: 2,
    austenitizeC: 800,
    soakMinutes: 5,
    quenchMedium: "brine",
    coldTreatment: "none",
    temperCycles: 2,
    temperC: 205,
    temperHours: 1,
    hardness: [{ hrc: 60, spot: "edge" }],
    notes: "",
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return (res.body as NotebookEntryResponse).entry.id;
}
