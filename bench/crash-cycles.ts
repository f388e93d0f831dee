/**
 * `npm run bench:crash [-- CYCLES [SEED]]`: the kill -9 recovery cycles of
 * tests/server/crash-recovery.test.ts, many more of them (default 20; the guide's nightly figure
 * is 50). Prints one line per cycle and stores the totals in bench/results.json under
 * "crashCycles" (other sections are kept). Loopback only; bounded by the cycle count.
 */
import { runCrashCycles } from "../tests/support/crash-cycles";
import { machineNote, mergeResults } from "./merge-results";

const cycles = Number(process.argv[2] ?? 20);
const seed = process.argv[3] !== undefined ? Number(process.argv[3]) : Math.floor(Math.random() * 2 ** 31);
if (!Number.isInteger(cycles) || cycles < 1 || cycles > 500) throw new Error("CYCLES must be an integer from 1 to 500");

const quantile = (values: number[], q: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)];
};

console.log(`kill -9 cycles: ${cycles}, seed ${seed}`);
const report = await runCrashCycles({ cycles, seed, students: 8, log: (l) => console.log(l) });
const sum = (f: (c: (typeof report.cycles)[number]) => number) => report.cycles.reduce((n, c) => n + f(c), 0);
const restart = report.cycles.map((c) => c.restartToReadyMs);
const section = {
  machine: machineNote(),
  seed,
  cycles: report.cycles.length,
  students: report.students,
  acknowledged: sum((c) => c.acknowledged),
  retried: sum((c) => c.unacknowledged),
  committedButUnacknowledged: sum((c) => c.committedButUnacknowledged),
  missing: sum((c) => c.missing),
  duplicates: sum((c) => c.duplicates),
  unexpectedRows: Math.max(...report.cycles.map((c) => c.unexpectedRows)),
  errors: sum((c) => c.errors.length),
  integrityOkCycles: report.cycles.filter((c) => c.integrity === "ok" && c.foreignKeyViolations === 0).length,
  rowsAtEnd: report.totalRows,
  keysHeldByClients: report.totalAcknowledged,
  restartToReadyMs: { p50: quantile(restart, 0.5), p99: quantile(restart, 0.99), max: Math.max(...restart) },
  finalSigtermExit: report.finalExit,
  description:
    "Real server (node --import tsx server/index.ts) on a temporary SQLite file; students stream quiz submissions with unique idempotency keys (one in flight each); SIGKILL at a seeded random 0.3-3 s; restart; retry unacknowledged keys; check rows per key, integrity_check and foreign_key_check after every cycle.",
};
mergeResults("crashCycles", section);
console.log(JSON.stringify(section, null, 2));
const ok = section.missing === 0 && section.duplicates === 0 && section.unexpectedRows === 0 && section.errors === 0 && section.integrityOkCycles === cycles;
process.exitCode = ok ? 0 : 1;
