/**
 * A SHORT embedded list of very common passwords (all at least 8 characters, since shorter ones
 * already fail the length rule). It is deliberately small because it ships to the browser too,
 * for instant feedback in forms. The server adds the full list that ASVS 6.2.4 asks for (the
 * first 10,000 entries of a password frequency list, server/auth/common-password-list.ts) through
 * `addCommonPasswords`, so every schema using `isCommonPassword` checks the long list on the
 * server and only the short one in the browser. Compared case-insensitively.
 */
export const COMMON_PASSWORDS: ReadonlySet<string> = new Set([
  "password", "password1", "password12", "password123", "password1234", "passw0rd", "p@ssw0rd", "p@ssword",
  "12345678", "123456789", "1234567890", "12345678910", "0123456789", "87654321", "11111111", "00000000",
  "11223344", "12341234", "123123123", "1q2w3e4r", "1q2w3e4r5t", "1qaz2wsx", "zaq12wsx", "qwertyui",
  "qwertyuiop", "qwerty123", "qwerty12", "qwerty1234", "asdfghjkl", "asdfasdf", "zxcvbnm1", "abcd1234",
  "abc12345", "abcdefgh", "a1b2c3d4", "aa123456", "iloveyou", "iloveyou1", "sunshine", "sunshine1",
  "princess", "princess1", "football", "football1", "baseball", "basketball", "superman", "batman123",
  "whatever", "trustno1", "welcome1", "welcome123", "letmein1", "letmein123", "starwars", "computer",
  "michelle", "jennifer", "jordan23", "charlie1", "master123", "mustang1", "shadow12", "dragon12",
  "monkey123", "liverpool", "chocolate", "butterfly", "passport", "internet", "changeme", "changeme1",
  "admin123", "administrator", "adminadmin", "rootroot", "testtest", "test1234", "default1", "secret123",
  "q1w2e3r4", "q1w2e3r4t5", "1234qwer", "qazwsxedc", "987654321", "123654789", "147258369", "159753456",
  "password!", "password1!", "Password1", "Password123", "summer2024", "winter2024", "spring2024", "autumn2024",
  "summer2025", "winter2025", "spring2025", "autumn2025", "summer2026", "winter2026", "spring2026", "autumn2026",
  "lovely123", "freedom1", "hello123", "helloworld", "blink182", "pokemon1", "samsung1", "iloveyou2",
  "forge-demo-1",
].map((p) => p.toLowerCase()));

/** Extra lists added at start-up (server only; the browser bundle never imports them). */
const extraLists: ReadonlySet<string>[] = [];

/** Register a further list of lower-cased common passwords (server start-up). */
export function addCommonPasswords(list: ReadonlySet<string>): void {
  if (!extraLists.includes(list)) extraLists.push(list);
}

export function isCommonPassword(password: string): boolean {
  const lower = password.toLowerCase();
  return COMMON_PASSWORDS.has(lower) || extraLists.some((list) => list.has(lower));
}
