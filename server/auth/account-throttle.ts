import type { Config } from "../config";

/**
 * Per-account failure delay instead of a hard lockout (ASVS 6.1.1): after `freeFailures`
 * consecutive failures, the next attempt must wait baseDelayMs * 2^(failures - freeFailures),
 * capped at maxDelayMs (60 s by default). An attacker can therefore slow an account to one try
 * per minute but never lock its owner out; the per-IP limiter (express-rate-limit) caps each
 * source at 10 failures per 15 minutes on top of this.
 */
export function requiredWaitMs(
  failures: number,
  lastFailedAt: Date | null,
  now: number,
  cfg: Config["accountThrottle"],
): number {
  if (failures < cfg.freeFailures || !lastFailedAt) return 0;
  const delay = Math.min(cfg.maxDelayMs, cfg.baseDelayMs * 2 ** (failures - cfg.freeFailures));
  return Math.max(0, lastFailedAt.getTime() + delay - now);
}

/**
 * The same rule for e-mail addresses that have no account, kept in memory, so a throttled answer
 * does not reveal whether an account exists. Bounded: the oldest entries are dropped.
 */
export class UnknownEmailThrottle {
  private readonly failures = new Map<string, { count: number; last: Date }>();

  constructor(
    private readonly cfg: Config["accountThrottle"],
    private readonly maxEntries = 10_000,
  ) {}

  waitMs(email: string, now: number): number {
    const entry = this.failures.get(email);
    return entry ? requiredWaitMs(entry.count, entry.last, now, this.cfg) : 0;
  }

  recordFailure(email: string, now: number): void {
    const entry = this.failures.get(email);
    this.failures.delete(email); // re-insert to keep Map order = recency
    this.failures.set(email, { count: (entry?.count ?? 0) + 1, last: new Date(now) });
    if (this.failures.size > this.maxEntries) {
      const oldest = this.failures.keys().next().value;
      if (oldest !== undefined) this.failures.delete(oldest);
    }
  }
}
