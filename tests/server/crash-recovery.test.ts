/**
 * kill -9 recovery (reliability guide §5b, goal 1): the real server in a child process is killed
 * with SIGKILL while students stream quiz submissions, restarted on the same files, and the
 * unacknowledged submissions are retried with their idempotency keys. Every acknowledged and
 * retried key must be stored exactly once and the database must pass integrity_check and
 * foreign_key_check. The cycle logic lives in tests/support/crash-cycles.ts (shared with
 * `npm run bench:crash`, which runs many more cycles).
 *
 * Replay a run: CRASH_SEED=<seed printed below> npx vitest run --project unit tests/server/crash-recovery.test.ts
 */
import { describe, expect, it } from "vitest";
import { runCrashCycles } from "../support/crash-cycles";

const seed = process.env.CRASH_SEED ? Number(process.env.CRASH_SEED) : Math.floor(Math.random() * 2 ** 31);
const cycles = process.env.CRASH_CYCLES ? Number(process.env.CRASH_CYCLES) : 3;

describe("kill -9 while submissions stream", () => {
  it(`loses and duplicates nothing acknowledged, over ${cycles} cycles (seed ${seed})`, { timeout: 300_000 }, async () => {
    console.log(`crash-recovery seed ${seed} (replay with CRASH_SEED=${seed})`);
    const report = await runCrashCycles({ cycles, seed, students: 6, log: (l) => console.log(l) });
    const context = `seed ${seed}`;

    expect(report.cycles, context).toHaveLength(cycles);
    for (const c of report.cycles) {
      expect(c.errors, `${context}, cycle ${c.cycle}`).toEqual([]);
      expect(c.missing, `${context}, cycle ${c.cycle}`).toBe(0);
      expect(c.duplicates, `${context}, cycle ${c.cycle}`).toBe(0);
      expect(c.unexpectedRows, `${context}, cycle ${c.cycle}`).toBe(0);
      expect(c.integrity, `${context}, cycle ${c.cycle}`).toBe("ok");
      expect(c.foreignKeyViolations, `${context}, cycle ${c.cycle}`).toBe(0);
      // Each student had one submission in flight at the kill (or had just been answered).
      expect(c.unacknowledged, `${context}, cycle ${c.cycle}`).toBeLessThanOrEqual(6);
    }
    // The stream really ran: submissions were acknowledged across the cycles.
    expect(report.totalAcknowledged, context).toBeGreaterThan(0);
    // Every key the clients hold, acknowledged or retried, is one row; no row beyond them.
    expect(report.totalRows, context).toBe(report.totalAcknowledged);
    // And after all that, a clean SIGTERM still exits 0.
    expect(report.finalExit, context).toEqual({ code: 0, signal: null });
  });
});
