import { describe, expect, it } from "vitest";
import { freezingRangeC, liquidusTempC, solidusTempC } from "../../../../shared/metallurgy/solidification/liquidus-solidus";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("liquidus, solidus and freezing range of steels", () => {
  it("liquidus matches the check values", () => {
    // [Computed] science-reference §3.3 check 1 (formula [Checked: steelworks implementation]), ±0.05 °C
    expect(Math.abs(liquidusTempC({ C: 0.2, Si: 0.25, Mn: 0.8 }).value - 1514.6)).toBeLessThan(0.05);
    expect(Math.abs(liquidusTempC({ C: 1.0, Si: 0.25, Mn: 0.4 }).value - 1454.1)).toBeLessThan(0.05);
    expect(liquidusTempC({ C: 1.0, Si: 0.25, Mn: 0.4 }).warnings).toEqual([]);
  });

  it("warns outside calibration (440C-type) but computes", () => {
    // [Computed] §3.3 check 2: C 1.075, Cr 17, Mo 0.5, Mn 0.5, Si 0.5 → 1422.8 °C ±0.05 (warn)
    const r = liquidusTempC({ C: 1.075, Cr: 17, Mo: 0.5, Mn: 0.5, Si: 0.5 });
    expect(Math.abs(r.value - 1422.8)).toBeLessThan(0.05);
    expect(r.warnings.join(" ")).toMatch(/C = 1.075/);
    expect(r.warnings.join(" ")).toMatch(/Cr = 17/);
  });

  it("linearised solidus sums m_i·C_i/k_i (austenite k by default)", () => {
    // T_S = 1536 − Σ m_i C_i / k_i [Pub, mem], §3.3; 0.2 C, 0.25 Si, 0.8 Mn with k_γ 0.34 / 0.52 / 0.78
    const expected = 1536 - (78 * 0.2) / 0.34 - (7.6 * 0.25) / 0.52 - (4.9 * 0.8) / 0.78;
    expect(solidusTempC({ C: 0.2, Si: 0.25, Mn: 0.8 }).value).toBeCloseTo(expected, 10);
    const delta = 1536 - (78 * 0.2) / 0.19 - (7.6 * 0.25) / 0.77 - (4.9 * 0.8) / 0.76;
    expect(solidusTempC({ C: 0.2, Si: 0.25, Mn: 0.8 }, "delta").value).toBeCloseTo(delta, 10);
    const range = freezingRangeC({ C: 0.2, Si: 0.25, Mn: 0.8 });
    expect(range.value).toBeCloseTo(1536 - 78 * 0.2 - 7.6 * 0.25 - 4.9 * 0.8 - expected, 8);
    expect(range.value).toBeGreaterThan(0);
  });

  it("warns for elements the formulas leave out", () => {
    expect(liquidusTempC({ C: 0.8, W: 6 }).warnings.join(" ")).toMatch(/W has no term/);
    expect(solidusTempC({ C: 0.8, Cu: 0.2 }).warnings.join(" ")).toMatch(/Cu has no partition coefficient/);
  });

  it("rejects invalid compositions", () => {
    expect(() => liquidusTempC({ C: -0.1 })).toThrow(InputError);
    expect(() => liquidusTempC({ C: 60, Cr: 50 })).toThrow(/sum/);
    expect(() => solidusTempC({ C: 0.5 }, "beta" as never)).toThrow(/phase/);
  });
});
