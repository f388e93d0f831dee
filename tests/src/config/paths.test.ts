import { describe, expect, it } from "vitest";
import { isSafeNext, paths, signInPath } from "@/config/paths";

describe("post-sign-in redirect targets", () => {
  it("accepts same-origin absolute paths", () => {
    expect(isSafeNext("/learn")).toBe(true);
    expect(isSafeNext("/lab/carbides?grade=440C")).toBe(true);
  });

  it("rejects anything that could leave the site or loop back to sign-in", () => {
    for (const next of ["//evil.example/", "https://evil.example/", "/\\evil.example", "javascript:alert(1)", "learn", "", null, undefined, "/sign-in?next=/learn"]) {
      expect(isSafeNext(next), String(next)).toBe(false);
    }
  });

  it("builds sign-in links that carry a safe target and drop an unsafe one", () => {
    expect(signInPath("/teach?tab=1")).toBe("/sign-in?next=%2Fteach%3Ftab%3D1");
    expect(signInPath("//evil.example")).toBe(paths.signIn);
    expect(paths.labSimulation("passive-film")).toBe("/lab/passive-film");
  });
});
