import { describe, expect, it } from "vitest";
import { MOLAR_MASS_G_PER_MOL as M } from "@shared/metallurgy/composition";
import { ABRASIVES, CARBIDE_DATA, CARBIDE_STOICHIOMETRY, CARBIDE_TYPES } from "@shared/metallurgy/carbides";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);
const rel = (actual: number, expected: number, r = 1e-3) => within(actual, expected, Math.abs(expected) * r);

describe("carbide data (science-reference §2.1)", () => {
  it("has the stoichiometric constants", () => {
    // [Computed] science-reference §2.1 "Stoichiometric constants", relative 1e-3
    rel(CARBIDE_STOICHIOMETRY.carbonInCementiteMassPct, 6.69);
    rel(CARBIDE_STOICHIOMETRY.vanadiumToCarbonMassRatioVC, 4.241);
    rel(CARBIDE_STOICHIOMETRY.carbonPerVanadiumVC, 0.2358);
    rel(CARBIDE_STOICHIOMETRY.carbonPerVanadiumVC0875, 0.2063);
    rel(CARBIDE_STOICHIOMETRY.chromiumToCarbonCr23C6, 16.595);
    rel(CARBIDE_STOICHIOMETRY.chromiumToCarbonCr7C3, 10.101);
    rel(CARBIDE_STOICHIOMETRY.ironToCarbonFe3C, 13.948);
  });

  it("has the pure-carbide molar volumes of CARB-1 step 4", () => {
    // [Computed] science-reference §2.2 step 4
    expect(CARBIDE_DATA.MC.molarVolumeCm3PerMol).toBe(10.91);
    expect(CARBIDE_DATA.M3C.molarVolumeCm3PerMol).toBe(23.35);
    expect(CARBIDE_DATA.M7C3.molarVolumeCm3PerMol).toBe(57.8);
    expect(CARBIDE_DATA.M23C6.molarVolumeCm3PerMol).toBe(181.92);
    expect(CARBIDE_DATA.M6C.molarVolumeCm3PerMol).toBe(51.47);
    // consistency with formula mass / density where the reference derives them so
    rel((3 * M.Fe + M.C) / CARBIDE_DATA.M3C.densityGPerCm3, 23.35); // Fe3C / 7.69
    rel((23 * M.Cr + 6 * M.C) / CARBIDE_DATA.M23C6.densityGPerCm3, 181.92); // Cr23C6 / 6.97
    rel((M.V + M.C) / CARBIDE_DATA.MC.densityGPerCm3, 10.91); // VC / 5.77
    rel((3 * M.Fe + 3 * M.W + M.C) / CARBIDE_DATA.M6C.densityGPerCm3, 51.47); // Fe3W3C / 14.2
  });

  it("has hardness ranges and checked pure-compound values", () => {
    expect(CARBIDE_DATA.M23C6.pureHv).toBe(976); // [Checked] §2.1 encyclopedia entry
    expect(CARBIDE_DATA.M7C3.pureHv).toBe(1336); // [Checked] §2.1
    expect(CARBIDE_DATA.M2C.pureHv).toBe(2498); // [Checked] §2.1 PMC table
    expect(CARBIDE_DATA.MC.pureHv).toBe(2763); // [Checked] §2.1 PMC table
    expect(CARBIDE_DATA.MC.densityGPerCm3).toBe(5.77); // [Checked] §2.1
    expect(CARBIDE_DATA.WC.densityGPerCm3).toBe(15.63); // [Checked] §2.1
    for (const c of Object.values(CARBIDE_DATA)) {
      expect(c.typicalHv).toBeGreaterThanOrEqual(c.hvRange[0]);
      expect(c.typicalHv).toBeLessThanOrEqual(c.hvRange[1]);
      expect(c.tags.hardness.length).toBeGreaterThan(0);
      expect(c.molarVolumeCm3PerMol).toBeGreaterThan(0);
    }
    // stability order MC > M6C > M7C3 > M23C6 > M3C also in hardness
    const hv = CARBIDE_TYPES.map((t) => CARBIDE_DATA[t].typicalHv);
    for (let i = 1; i < hv.length; i++) expect(hv[i]).toBeLessThan(hv[i - 1]);
  });

  it("has the abrasives of §2.1 with the §2.6 check hardnesses", () => {
    expect(ABRASIVES.quartz.typicalHv).toBe(1100); // [Mem] §2.1 / §2.6
    expect(ABRASIVES["aluminium-oxide"].typicalHv).toBe(2000); // [Mem]
    expect(ABRASIVES["silicon-carbide"].typicalHv).toBe(2600); // [Checked] PMC table
    expect(ABRASIVES.cbn.typicalHv).toBe(4500); // [Mem]
    expect(ABRASIVES.diamond.typicalHv).toBe(9000); // [Mem] range 8000–10000
  });
});
