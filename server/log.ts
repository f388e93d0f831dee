/**
 * Minimal structured logger: one JSON object per line on stdout/stderr. JSON encoding also
 * neutralises log injection (newlines in user input cannot forge extra lines).
 * Never pass passwords, session ids, CSRF tokens or hashes in `fields`.
 */
export type LogLevel = "silent" | "error" | "warn" | "info";
const RANK: Record<LogLevel, number> = { silent: 0, error: 1, warn: 2, info: 3 };

export interface Logger {
  info(msg: string, fields?: Record<string, unknown>): void;
  warn(msg: string, fields?: Record<string, unknown>): void;
  error(msg: string, fields?: Record<string, unknown>): void;
}

export function createLogger(level: LogLevel): Logger {
  const emit = (at: Exclude<LogLevel, "silent">, msg: string, fields?: Record<string, unknown>) => {
    if (RANK[at] > RANK[level]) return;
    const line = JSON.stringify({ time: new Date().toISOString(), level: at, msg, ...fields });
    (at === "info" ? process.stdout : process.stderr).write(`${line}\n`);
  };
  return {
    info: (msg, fields) => emit("info", msg, fields),
    warn: (msg, fields) => emit("warn", msg, fields),
    error: (msg, fields) => emit("error", msg, fields),
  };
}
