import { describe, expect, it } from "vitest";
import { navItemsFor } from "@/app/layout/nav-items";

const user = (role: "student" | "instructor" | "admin") => ({ id: 1, email: "x@y.test", displayName: "X", role });

describe("main navigation", () => {
  it("offers a signed-out visitor the public lab and the self-study pass", () => {
    expect(navItemsFor(null).map((i) => i.to)).toEqual(["/lab", "/join"]);
  });

  it("puts each role's own home first", () => {
    expect(navItemsFor(user("student"))[0].to).toBe("/learn");
    expect(navItemsFor(user("instructor"))[0].to).toBe("/teach");
    expect(navItemsFor(user("admin"))[0].to).toBe("/admin");
    expect(navItemsFor(user("student")).map((i) => i.to)).toContain("/account");
  });
});
