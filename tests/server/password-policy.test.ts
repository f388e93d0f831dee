/**
 * Common-password policy (ASVS 5.0 6.2.4, reliability guide goal 8): the server rejects the top
 * 3,000 passwords of a frequency list (we take the first 10,000 of @zxcvbn-ts/language-common's
 * "passwords-common"), through the same shared zod schema the API validates with; the browser
 * bundle only ever sees the short list.
 */
import fs from "node:fs";
import path from "node:path";
import { dictionary } from "@zxcvbn-ts/language-common";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { passwordSchema } from "../../shared/api/auth";
import { COMMON_PASSWORDS } from "../../shared/api/common-passwords";
import { COMMON_PASSWORD_TOP_N, SERVER_COMMON_PASSWORDS } from "../../server/auth/common-password-list";
import { PROJECT_ROOT } from "../../server/config";
import { createTestApp, createUser, signIn, type TestApp } from "../support/test-app";

const rejected = (p: string) => {
  const r = passwordSchema.safeParse(p);
  return !r.success && r.error.issues.some((i) => /too common/.test(i.message));
};

describe("the server's common-password list", () => {
  it("covers every entry of the list's top 3,000 that passes the length rule", () => {
    const top3000 = dictionary["passwords-common"].slice(0, 3000).filter((p) => p.length >= 8);
    expect(top3000.length).toBe(675); // of the top 3,000, these are 8 characters or longer
    expect(COMMON_PASSWORD_TOP_N).toBeGreaterThanOrEqual(3000);
    expect(SERVER_COMMON_PASSWORDS.size).toBe(3534); // 8+ characters among the first 10,000
    expect(top3000.filter((p) => !rejected(p))).toEqual([]);
  });

  it("rejects well-known passwords, case-insensitively, including ones the short browser list lacks", () => {
    for (const p of ["password1", "qwerty123", "iloveyou", "Password1", "QWERTY123"]) expect(rejected(p), p).toBe(true);
    // From the frequency list only: proves the long list is in force on the server.
    for (const p of ["maverick", "mercedes", "slipknot", "Scorpion", "midnight"]) {
      expect(COMMON_PASSWORDS.has(p.toLowerCase()), p).toBe(false);
      expect(rejected(p), p).toBe(true);
    }
  });

  it("accepts a long random passphrase and ordinary uncommon passwords", () => {
    for (const p of ["tallow brine ember 47 grindstone", "quench-in-warm-oil", "anvil-and-quench-7"]) {
      expect(passwordSchema.safeParse(p).success, p).toBe(true);
    }
  });

  it("never reaches the browser bundle: no client or shared module imports it", () => {
    const offenders: string[] = [];
    const walk = (dir: string): void => {
      for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
        const full = path.join(dir, e.name);
        if (e.isDirectory()) walk(full);
        else if (/\.(ts|tsx|mts|js|mdx)$/.test(e.name)) {
          const text = fs.readFileSync(full, "utf8");
          // Import specifiers only (comments may name the server file).
          const specifiers = [...text.matchAll(/(?:from|import)\s*\(?\s*["']([^"']+)["']/g)].map((m) => m[1]);
          if (specifiers.some((s) => /@zxcvbn-ts|common-password-list|server\//.test(s))) offenders.push(path.relative(PROJECT_ROOT, full));
        }
      }
    };
    for (const dir of ["src", "shared", "content"]) walk(path.join(PROJECT_ROOT, dir));
    expect(offenders).toEqual([]);
  });
});

describe("through the API", () => {
  let t: TestApp;
  const PASSWORD = "anvil-and-quench-7";
  beforeAll(async () => {
    t = await createTestApp({ env: { LOGIN_RATE_LIMIT: "1000" } });
    await createUser(t, { email: "policy@cinderfield.test", role: "student", password: PASSWORD });
  });
  afterAll(() => t?.cleanup());

  it("a password change to a listed password gets 400 naming newPassword; a passphrase is accepted", async () => {
    const { agent, csrfToken } = await signIn(t.app, "policy@cinderfield.test", PASSWORD);
    const common = await agent
      .post("/api/auth/password")
      .set("x-csrf-token", csrfToken)
      .send({ currentPassword: PASSWORD, newPassword: "steelers" })
      .expect(400);
    expect(common.body.error.code).toBe("validation_failed");
    expect(common.body.error.fields.newPassword[0]).toMatch(/too common/);

    await agent
      .post("/api/auth/password")
      .set("x-csrf-token", csrfToken)
      .send({ currentPassword: PASSWORD, newPassword: "tallow brine ember 47 grindstone" })
      .expect(204);
  });
});
