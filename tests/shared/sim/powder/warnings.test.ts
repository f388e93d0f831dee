import { describe, expect, it } from "vitest";
import { describeClasses, groupPowderWarnings, mergeNumbers } from "@shared/sim/powder/warnings";
import { computePowderClasses } from "@shared/sim/powder/classes";
import { parsePowderParams } from "@shared/sim/powder/params";

const rate = (r: string) => `Cooling rate ${r} °C/s is above the casting data (≈0.01–100 °C/s): a teaching extrapolation.`;
const CARBON = "C = 2.45 % is above 1.0 % C, the calibration limit of the arm-spacing fit.";
const cls = (lowerUm: number, upperUm: number, warnings: string[]) => ({ lowerUm, upperUm, warnings });

describe("powder model warnings, once each", () => {
  it("merges a warning repeated per class with a changing number into one line with the range", () => {
    const classes = [cls(4, 5, [rate("1.83e+7"), CARBON]), cls(5, 6.6, [rate("1.14e+7"), CARBON]), cls(6.6, 8.4, [rate("6.89e+6"), CARBON])];
    const grouped = groupPowderWarnings([], classes);
    expect(grouped).toEqual([
      { message: rate("6.89e+6–1.83e+7"), classIndices: [0, 1, 2], where: "all 3 size classes" },
      { message: CARBON, classIndices: [0, 1, 2], where: "all 3 size classes" },
    ]);
  });

  it("keeps every distinct warning (no cut-off) and names the classes of each", () => {
    const distinct = Array.from({ length: 7 }, (_, i) => `Distinct warning ${String.fromCharCode(65 + i)}.`);
    const classes = distinct.map((w, i) => cls(10 * (i + 1), 10 * (i + 2), [w, rate(`${i + 1}.00e+4`)]));
    const grouped = groupPowderWarnings(["The liquidus formula is extrapolated."], classes);
    expect(grouped.map((g) => g.message)).toEqual(["The liquidus formula is extrapolated.", distinct[0], rate("1.00e+4–7.00e+4"), ...distinct.slice(1)]);
    expect(grouped[0].where).toBe("");
    expect(grouped[1].where).toBe("size class 10–20 µm (1 of 7)");
  });

  it("names runs of neighbouring classes as diameter spans", () => {
    const classes = [4, 5, 6, 7, 8].map((d) => cls(d, d + 1, []));
    expect(describeClasses([0, 1, 3, 4], classes)).toBe("size classes 4–6 µm and 7–9 µm (4 of 5)");
    expect(describeClasses([0, 2, 4], classes)).toBe("size classes 4–5 µm, 6–7 µm and 8–9 µm (3 of 5)");
    expect(describeClasses([], classes)).toBe("");
  });

  it("leaves numbers that do not change alone and sorts the changing ones by value", () => {
    expect(mergeNumbers(["A 20 at 1.5e+3 of 100.", "A 20 at 9.5e+2 of 100.", "A 20 at 2e+4 of 100."])).toBe("A 20 at 9.5e+2–2e+4 of 100.");
  });

  it("turns the default A11 run's 28+ per-class warnings into a handful of lines", () => {
    const result = computePowderClasses(parsePowderParams({}));
    const perClass = result.classes.flatMap((c) => c.warnings).length;
    const grouped = groupPowderWarnings(result.warnings, result.classes.map((c) => ({ lowerUm: c.lowerM * 1e6, upperUm: c.upperM * 1e6, warnings: c.warnings })));
    expect(perClass).toBeGreaterThan(2 * result.classes.length - 1);
    // Every distinct message survives: each class's warning shape is in some line.
    const shapes = new Set([...result.warnings, ...result.classes.flatMap((c) => c.warnings)].map((w) => w.replace(/\d+(?:\.\d+)?(?:e[+-]?\d+)?/gi, "#")));
    expect(grouped).toHaveLength(shapes.size);
    const cooling = grouped.find((g) => g.message.startsWith("Cooling rate"));
    expect(cooling?.where).toBe(`all ${result.classes.length} size classes`);
    expect(cooling?.message).toMatch(/^Cooling rate \d\.\d\de\+\d–\d\.\d\de\+\d °C\/s is above/);
  });
});
