import { randomBytes } from "node:crypto";
import argon2 from "argon2";
// For its effect: the shared password schema rejects the full common-password list on the server.
import "./common-password-list";

/**
 * argon2id with the OWASP / ASVS 11.4.2 minimum: 19 MiB memory, 2 passes, 1 lane
 * (measured ~67 ms per hash on the 2-core machine). Passwords are hashed exactly as typed:
 * no trimming, no truncation (argon2 takes any length; the API caps input at 128 characters).
 */
export const ARGON2_OPTIONS = { type: argon2.argon2id, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

/**
 * At most 2 hashes at a time: argon2 and sqlite3 share the libuv thread pool, and an unbounded
 * burst of sign-ins would starve database queries (and memory: 19 MiB each).
 */
const MAX_CONCURRENT_HASHES = 2;
let running = 0;
const waiting: (() => void)[] = [];

async function withHashSlot<T>(fn: () => Promise<T>): Promise<T> {
  if (running >= MAX_CONCURRENT_HASHES) await new Promise<void>((resolve) => waiting.push(resolve));
  else running += 1;
  try {
    return await fn();
  } finally {
    const next = waiting.shift();
    if (next) next(); // hand the slot over directly
    else running -= 1;
  }
}

export function hashPassword(password: string): Promise<string> {
  return withHashSlot(() => argon2.hash(password, ARGON2_OPTIONS));
}

/** False for a wrong password or a malformed stored hash. */
export function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  return withHashSlot(async () => {
    try {
      return await argon2.verify(passwordHash, password);
    } catch {
      return false;
    }
  });
}

let dummyHash: Promise<string> | undefined;

/**
 * Verify against a hash of a random secret, for sign-ins with an unknown e-mail, so they take as
 * long as a wrong password for a real account (no user enumeration by timing, ASVS 6.3.8).
 */
export async function verifyAgainstDummy(password: string): Promise<false> {
  dummyHash ??= argon2.hash(randomBytes(32).toString("hex"), ARGON2_OPTIONS);
  await verifyPassword(await dummyHash, password);
  return false;
}
