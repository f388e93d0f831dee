/**
 * Merge one top-level section into bench/results.json, keeping every other section as it is
 * (the core, browser, load and crash sections are written by different scripts).
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { fileURLToPath } from "node:url";

export const RESULTS_FILE = fileURLToPath(new URL("./results.json", import.meta.url));

export function mergeResults(key: string, section: unknown): void {
  const current = existsSync(RESULTS_FILE) ? (JSON.parse(readFileSync(RESULTS_FILE, "utf8")) as Record<string, unknown>) : {};
  current[key] = section;
  writeFileSync(RESULTS_FILE, `${JSON.stringify(current, null, 2)}\n`);
}

/** Where and when a figure was measured (stored inside each section). */
export function machineNote() {
  return {
    node: process.version,
    cpus: cpus().length,
    cpuModel: cpus()[0]?.model ?? "unknown",
    date: new Date().toISOString(),
    loadAverage1Min: Number(loadavg()[0].toFixed(2)),
  };
}
