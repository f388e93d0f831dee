import { describe, expect, it } from "vitest";
import { InputError } from "@shared/metallurgy/errors";
import { latticeDimension, neighbourOffsets, resolveDimensions } from "@shared/metallurgy/passivity";

const key = (o: readonly number[]) => o.join(",");

describe("neighbourOffsets", () => {
  it("has the coordination numbers of the §1a table", () => {
    const z = (l: never, n: 1 | 2) => neighbourOffsets(l, n).length;
    expect(z("square" as never, 1)).toBe(4); // [Checked] §1a table
    expect(z("square" as never, 2)).toBe(8);
    expect(z("triangular" as never, 1)).toBe(6);
    expect(z("triangular" as never, 2)).toBe(12);
    expect(z("sc" as never, 1)).toBe(6);
    expect(z("sc" as never, 2)).toBe(18);
    expect(z("bcc" as never, 1)).toBe(8);
    expect(z("bcc" as never, 2)).toBe(14);
  });

  it("builds bcc in primitive coordinates as science-reference §1a check 4 describes", () => {
    const nn = new Set(neighbourOffsets("bcc", 1).map(key));
    for (const v of ["1,0,0", "-1,0,0", "0,1,0", "0,-1,0", "0,0,1", "0,0,-1", "1,1,1", "-1,-1,-1"]) expect(nn.has(v)).toBe(true);
    const all = new Set(neighbourOffsets("bcc", 2).map(key));
    for (const v of ["0,1,1", "0,-1,-1", "1,0,1", "-1,0,-1", "1,1,0", "-1,-1,0"]) expect(all.has(v)).toBe(true);
  });

  it("is symmetric and free of duplicates", () => {
    for (const l of ["square", "triangular", "sc", "bcc"] as const) {
      for (const n of [1, 2] as const) {
        const offs = neighbourOffsets(l, n);
        const set = new Set(offs.map(key));
        expect(set.size).toBe(offs.length);
        for (const [dx, dy, dz] of offs) expect(set.has(key([-dx, -dy, -dz]))).toBe(true);
      }
    }
  });

  it("rejects unknown lattices and shells", () => {
    expect(() => neighbourOffsets("fcc" as never, 1)).toThrow(InputError);
    expect(() => neighbourOffsets("sc", 3 as never)).toThrow(InputError);
  });
});

describe("resolveDimensions", () => {
  it("expands an edge length and pads 2-D with nz = 1", () => {
    expect(resolveDimensions("sc", 4)).toEqual([4, 4, 4]);
    expect(resolveDimensions("square", 5)).toEqual([5, 5, 1]);
    expect(resolveDimensions("bcc", [8, 8, 3])).toEqual([8, 8, 3]);
    expect(latticeDimension("triangular")).toBe(2);
  });

  it("rejects wrong shapes", () => {
    expect(() => resolveDimensions("sc", [4, 4])).toThrow(InputError);
    expect(() => resolveDimensions("square", 0)).toThrow(InputError);
    expect(() => resolveDimensions("square", 2.5)).toThrow(InputError);
    expect(() => resolveDimensions("sc", 1000)).toThrow(InputError);
  });
});
