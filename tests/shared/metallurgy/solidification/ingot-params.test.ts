import { describe, expect, it } from "vitest";
import { createIngot } from "../../../../shared/metallurgy/solidification/ingot";
import { INGOT_DEFAULTS, MOULD_HEAT_TRANSFER_W_PER_M2K } from "../../../../shared/metallurgy/solidification/ingot-params";
import { liquidusTempC, solidusTempC } from "../../../../shared/metallurgy/solidification/liquidus-solidus";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("ingot parameters", () => {
  it("fills in the documented defaults", () => {
    const state = createIngot({ halfThicknessM: 0.1, pourTempC: 1520, composition: { C: 0.8, Cr: 1 } });
    const p = state.params;
    expect(p.geometry).toBe("slab");
    expect(p.cells).toBe(INGOT_DEFAULTS.cells);
    expect(p.latentHeatMethod).toBe("enthalpy");
    // [App] illustrative mould coefficients (sand 50, metal 500, water-cooled 2000 W/m²K)
    expect(MOULD_HEAT_TRANSFER_W_PER_M2K).toEqual({ sand: 50, metal: 500, "water-cooled": 2000 });
    expect(p.wallHeatTransferWPerM2K).toBe(50);
    expect(p.wallSinkTempC).toBe(25);
    // [Mem] steel properties, science-reference §3.6
    expect([p.conductivityWPerMK, p.densityKgPerM3, p.heatCapacityJPerKgK, p.latentHeatJPerKg]).toEqual([30, 7400, 680, 2.7e5]);
    expect(p.liquidusTempC).toBe(liquidusTempC({ C: 0.8, Cr: 1 }).value);
    expect(p.solidusTempC).toBe(solidusTempC({ C: 0.8, Cr: 1 }).value);
    expect(p.trackedElements).toEqual(["C", "Cr"]);
    expect(state.solutes.map((s) => s.partitionCoefficient)).toEqual([0.34, 0.86]);
    expect(state.tempC.every((t) => t === 1520)).toBe(true);
    expect(state.liquidusTimeS.every((t) => t === -1)).toBe(true);
  });

  it("rejects invalid parameters with the parameter named", () => {
    const ok = { halfThicknessM: 0.1, pourTempC: 1520, composition: { C: 0.8 } };
    expect(() => createIngot({ ...ok, pourTempC: 1400 })).toThrow(/pourTempC/);
    expect(() => createIngot({ halfThicknessM: 0.1, pourTempC: 1520 })).toThrow(/composition/);
    expect(() => createIngot({ ...ok, cells: 3 })).toThrow(/cells/);
    expect(() => createIngot({ ...ok, cells: 10.5 })).toThrow(InputError);
    expect(() => createIngot({ ...ok, halfThicknessM: 0 })).toThrow(/halfThicknessM/);
    expect(() => createIngot({ ...ok, geometry: "sphere" as never })).toThrow(/geometry/);
    expect(() => createIngot({ ...ok, wall: { type: "mould", mould: "clay" as never } })).toThrow(/wall.mould/);
    expect(() => createIngot({ ...ok, trackedElements: ["W"] })).toThrow(/trackedElements/);
    expect(() => createIngot({ ...ok, trackedElements: ["V"] })).toThrow(/composition.V/);
    expect(() => createIngot({ ...ok, boundaryLayerM: -1 })).toThrow(/boundaryLayerM/);
    expect(() => createIngot({ ...ok, reportSolidFraction: 1 })).toThrow(/reportSolidFraction/);
    expect(() =>
      createIngot({ halfThicknessM: 0.1, pourTempC: 1520, liquidusTempC: 1500, solidusTempC: 1500, latentHeatMethod: "effective-heat-capacity" }),
    ).toThrow(/enthalpy method/);
    expect(() => createIngot({ halfThicknessM: 0.1, pourTempC: 1520, liquidusTempC: 1400, solidusTempC: 1450 })).toThrow(/solidusTempC/);
  });

  it("warns when back-diffusion cannot be evaluated", () => {
    const noCarbon = createIngot({ halfThicknessM: 0.1, pourTempC: 1560, composition: { Cr: 12 } });
    expect(noCarbon.warnings.join(" ")).toMatch(/No carbon/);
    const narrow = createIngot({ halfThicknessM: 0.1, pourTempC: 1520, liquidusTempC: 1500, solidusTempC: 1495, latentHeatMethod: "effective-heat-capacity" });
    expect(narrow.warnings.join(" ")).toMatch(/narrow/);
  });
});
