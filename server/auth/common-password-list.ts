/**
 * The server's common-password list (ASVS 5.0 6.2.4: block at least the top 3,000 passwords).
 * Source: the "passwords-common" frequency dictionary of @zxcvbn-ts/language-common 4.1.3
 * (most frequent first, lower case). We take its first 10,000 entries and keep those of 8 or more
 * characters (3,534 of them; shorter ones already fail the length rule), so every entry of the top
 * 3,000 that could pass the length rule is rejected, and a good margin beyond it.
 *
 * Server-only: imported for its effect by server/auth/passwords.ts. The shared zod schema
 * (shared/api/auth.ts) then consults it on the server, while the browser bundle keeps the short
 * list in shared/api/common-passwords.ts (the package is ~380 kB and never reaches the client).
 */
import { dictionary } from "@zxcvbn-ts/language-common";
import { addCommonPasswords } from "../../shared/api/common-passwords";

/** How many of the most frequent passwords are taken from the frequency list. */
export const COMMON_PASSWORD_TOP_N = 10_000;

export const SERVER_COMMON_PASSWORDS: ReadonlySet<string> = new Set(
  dictionary["passwords-common"]
    .slice(0, COMMON_PASSWORD_TOP_N)
    .map((p) => p.toLowerCase())
    .filter((p) => p.length >= 8),
);

addCommonPasswords(SERVER_COMMON_PASSWORDS);
