import { describe, expect, it } from "vitest";
import { z } from "zod";
import { fieldKind, searchParamsToInput } from "@shared/sim/url-input";
import { paramsSchema as ingotSchema, parseIngotSimParams } from "@shared/sim/ingot/params";
import { paramsSchema as powderSchema, parsePowderParams } from "@shared/sim/powder/params";
import { carbideParamsSchema, parseCarbideParams } from "@shared/sim/carbides";
import { passiveFilmParamsSchema, parsePassiveFilmParams } from "@shared/sim/passive-film/params";

// Grade ids that look like numbers ("1095", "52100", "420") used to become numbers and fail the schema.
const NUMERIC_LOOKING_GRADES = ["1095", "52100", "1080", "5160", "420"];
const OTHER_GRADES = ["440C", "D2", "A11", "M2"];

describe("URL search string → simulation input (types come from the schema)", () => {
  it("keeps every grade id as text in the ingot URL and the ingot opens at that grade", () => {
    for (const grade of [...NUMERIC_LOOKING_GRADES, ...OTHER_GRADES]) {
      const input = searchParamsToInput(`?grade=${grade}&sizeMm=300&mixing=0.25&mould=metal`, ingotSchema);
      expect(input).toEqual({ grade, sizeMm: 300, mixing: 0.25, mould: "metal" });
      expect(parseIngotSimParams(input).gradeId).toBe(grade);
    }
  });

  it("keeps every grade id as text in the powder URL and the powder opens at that grade", () => {
    for (const grade of ["1095", "52100", "440C", "D2", "M2"]) {
      const input = searchParamsToInput(`grade=${grade}&medianDiameterUm=60&gas=Ar`, powderSchema);
      expect(input).toEqual({ grade, medianDiameterUm: 60, gas: "Ar" });
      expect(parsePowderParams(input).grade).toBe(grade);
    }
    // 52100 is the 1 % C, 1.5 % Cr bearing steel (ASTM A295, from memory: 0.98–1.10 C, 1.30–1.60 Cr).
    expect(parsePowderParams(searchParamsToInput("grade=52100", powderSchema)).composition.Cr).toBeCloseTo(1.45, 1);
  });

  it("keeps grade ids as text for the carbide simulation", () => {
    for (const grade of ["1095", "52100", "440C", "D2"]) {
      const input = searchParamsToInput(`grade=${grade}&coarseningHours=2`, carbideParamsSchema);
      expect(input).toEqual({ grade, coarseningHours: 2 });
      expect(parseCarbideParams(input).grade).toBe(grade);
    }
  });

  it("converts the passive-film numbers, including the 1 | 2 neighbour literal", () => {
    const input = searchParamsToInput("crMassPct=9&cMassPct=0.4&neighbours=1&carbide=M7C3&seed=12", passiveFilmParamsSchema);
    expect(input).toEqual({ crMassPct: 9, cMassPct: 0.4, neighbours: 1, carbide: "M7C3", seed: 12 });
    expect(parsePassiveFilmParams(input)).toMatchObject({ crMassPct: 9, neighbours: 1, carbide: "M7C3" });
  });

  it("ignores keys the schema does not name and empty values", () => {
    expect(searchParamsToInput("grade=&sizeMm=120&utm=x&size=3", ingotSchema)).toEqual({ sizeMm: 120 });
  });

  it("passes text that is not a number on as text, so the schema names the bad field", () => {
    const input = searchParamsToInput("sizeMm=big", ingotSchema);
    expect(input).toEqual({ sizeMm: "big" });
    const result = ingotSchema.safeParse(input);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(["sizeMm"]);
  });

  it("reads a field's kind through optional, default, pipe and unions", () => {
    expect(fieldKind(z.number().optional())).toBe("number");
    expect(fieldKind(z.number().default(3))).toBe("number");
    expect(fieldKind(z.string().refine((s) => s.length > 0).optional())).toBe("string");
    expect(fieldKind(z.enum(["1095", "D2"]))).toBe("string");
    expect(fieldKind(z.union([z.literal(1), z.literal(2)]).default(2))).toBe("number");
    expect(fieldKind(z.union([z.literal(1), z.literal("one")]))).toBe("string");
    expect(fieldKind(z.boolean().default(false))).toBe("boolean");
    expect(fieldKind(z.string().transform(Number).pipe(z.number()))).toBe("string");
    expect(searchParamsToInput("on=true&n=2", z.object({ on: z.boolean(), n: z.int() }))).toEqual({ on: true, n: 2 });
  });
});
