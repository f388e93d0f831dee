import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { GAS_PROPERTIES_1ATM } from "../../../../shared/metallurgy/data/gas-properties-1atm";

const CSV_PATH = fileURLToPath(new URL("../../../../shared/metallurgy/data/gas-properties-1atm.csv", import.meta.url));

describe("embedded gas-property table", () => {
  it("equals the CSV shipped beside it (shared/metallurgy/data/gas-properties-1atm.csv)", () => {
    // The core may not read files, so the CSV ([Computed] NIST/CoolProp, science-reference §4.2)
    // is embedded as a TS module; this guards the copy.
    const text = readFileSync(CSV_PATH, "utf8");
    const parsed = Papa.parse<Record<string, string>>(text, { header: true, comments: "#", skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const rows = parsed.data.map((r) => ({
      gas: r.gas,
      tempK: Number(r.temp_k),
      densityKgPerM3: Number(r.density_kg_m3),
      heatCapacityJPerKgK: Number(r.cp_j_kg_k),
      conductivityWPerMK: Number(r.conductivity_w_m_k),
      viscosityPaS: Number(r.viscosity_pa_s),
      prandtl: Number(r.prandtl),
    }));
    expect(rows).toHaveLength(36);
    expect(GAS_PROPERTIES_1ATM.map((r) => ({ ...r }))).toEqual(rows);
  });
});
