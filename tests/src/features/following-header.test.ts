import { describe, expect, it } from "vitest";
import { followingHeaderOffsetPx } from "@/features/teach/use-following-header";

describe("gradebook header that follows the page scroll", () => {
  const table = { insetTopPx: 64, boxHeightPx: 1000, headHeightPx: 60 };

  it("stays in place while the table's top is below the page's sticky bar", () => {
    expect(followingHeaderOffsetPx({ ...table, boxTopPx: 300 })).toBe(0);
    expect(followingHeaderOffsetPx({ ...table, boxTopPx: 64 })).toBe(0);
  });

  it("moves down by how far the table's top has gone under the sticky bar", () => {
    expect(followingHeaderOffsetPx({ ...table, boxTopPx: -200 })).toBe(264);
  });

  it("stops a row's height before the table's end instead of covering the rows below it", () => {
    expect(followingHeaderOffsetPx({ ...table, boxTopPx: -5000 })).toBe(1000 - 120);
    expect(followingHeaderOffsetPx({ ...table, boxHeightPx: 100, boxTopPx: -5000 })).toBe(0);
  });
});
