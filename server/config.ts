import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { z } from "zod";

/** Repository root (server/ lives one level below it). */
export const PROJECT_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");

const flag = (fallback: boolean) =>
  z
    .enum(["0", "1", "true", "false", "yes", "no", "on", "off", ""])
    .optional()
    .transform((v) => (v === undefined || v === "" ? fallback : ["1", "true", "yes", "on"].includes(v)));

const intFrom = (fallback: number, min: number, max: number) =>
  z.coerce.number().int().min(min).max(max).optional().default(fallback);

/**
 * Express "trust proxy": unset/"0"/"false" = do not trust X-Forwarded-*; a number = that many hops;
 * anything else is passed through (e.g. "loopback", "10.0.0.0/8").
 */
const trustProxySchema = z
  .string()
  .optional()
  .transform((v): boolean | number | string => {
    if (v === undefined || v === "" || v === "0" || v === "false") return false;
    if (v === "true") return true;
    if (/^\d+$/.test(v)) return Number(v);
    return v;
  });

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).optional().default("development"),
  PORT: intFrom(3000, 0, 65535),
  HOST: z.string().optional(),
  DATABASE_PATH: z.string().min(1).optional().default("data/grain-edge.sqlite"),
  SESSION_SECRET: z.string().min(32, "SESSION_SECRET must be at least 32 characters.").optional(),
  SEED_DEMO: flag(true),
  SMTP_URL: z.url().optional(),
  TRUST_PROXY: trustProxySchema,
  /** Secure cookies (with the __Host- prefix) and HSTS. Defaults to on when TRUST_PROXY is set (TLS at the proxy). */
  COOKIE_SECURE: z.enum(["0", "1", "true", "false", ""]).optional(),
  SESSION_IDLE_MINUTES: intFrom(120, 1, 24 * 60),
  SESSION_ABSOLUTE_HOURS: intFrom(12, 1, 24 * 30),
  LOGIN_RATE_WINDOW_MINUTES: intFrom(15, 1, 24 * 60),
  LOGIN_RATE_LIMIT: intFrom(10, 1, 100_000),
  CLIENT_DIST_DIR: z.string().optional(),
  /** Comma-separated extra origins allowed to make unsafe requests (default in development: the Vite dev server). */
  ALLOWED_ORIGINS: z.string().optional(),
  LOG_LEVEL: z.enum(["silent", "error", "warn", "info"]).optional(),
});

export interface Config {
  nodeEnv: "development" | "production" | "test";
  port: number;
  host: string | undefined;
  /** Absolute path of the SQLite file. */
  databasePath: string;
  sessionSecret: string;
  seedDemo: boolean;
  smtpUrl: string | undefined;
  trustProxy: boolean | number | string;
  /** HTTPS deployment: Secure + __Host- cookie, HSTS, CSP upgrade-insecure-requests. */
  cookieSecure: boolean;
  session: { idleTimeoutMs: number; absoluteTimeoutMs: number };
  /** express-rate-limit on POST /api/auth/login, per IP, counting failed attempts only. */
  loginRateLimit: { windowMs: number; limit: number };
  /**
   * Per-account failure delay (no hard lockout): after `freeFailures` consecutive failures each
   * attempt must wait baseDelayMs * 2^(extra failures), capped at maxDelayMs.
   */
  accountThrottle: { freeFailures: number; baseDelayMs: number; maxDelayMs: number };
  /** Extra origins accepted by the cross-site check (the app's own origin is always accepted). */
  allowedOrigins: string[];
  /** Absolute path of the built client (vite build output). */
  clientDistDir: string;
  logLevel: "silent" | "error" | "warn" | "info";
}

export type Env = Record<string, string | undefined>;

/**
 * Build the server configuration from environment variables, with defaults.
 * Throws one readable error listing every invalid variable.
 */
export function loadConfig(env: Env = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join("\n")}`);
  }
  const e = parsed.data;
  const databasePath = path.resolve(PROJECT_ROOT, e.DATABASE_PATH);
  const cookieSecure =
    e.COOKIE_SECURE === undefined || e.COOKIE_SECURE === ""
      ? e.TRUST_PROXY !== false
      : e.COOKIE_SECURE === "1" || e.COOKIE_SECURE === "true";

  return {
    nodeEnv: e.NODE_ENV,
    port: e.PORT,
    host: e.HOST || undefined,
    databasePath,
    sessionSecret: e.SESSION_SECRET ?? loadOrCreateSecret(path.dirname(databasePath)),
    seedDemo: e.SEED_DEMO,
    smtpUrl: e.SMTP_URL,
    trustProxy: e.TRUST_PROXY,
    cookieSecure,
    session: {
      idleTimeoutMs: e.SESSION_IDLE_MINUTES * 60_000,
      absoluteTimeoutMs: e.SESSION_ABSOLUTE_HOURS * 3_600_000,
    },
    loginRateLimit: { windowMs: e.LOGIN_RATE_WINDOW_MINUTES * 60_000, limit: e.LOGIN_RATE_LIMIT },
    accountThrottle: { freeFailures: 5, baseDelayMs: 1_000, maxDelayMs: 60_000 },
    allowedOrigins:
      e.ALLOWED_ORIGINS !== undefined
        ? e.ALLOWED_ORIGINS.split(",").map((o) => o.trim()).filter(Boolean)
        : e.NODE_ENV === "development"
          ? ["http://localhost:5173", "http://127.0.0.1:5173"]
          : [],
    clientDistDir: path.resolve(PROJECT_ROOT, e.CLIENT_DIST_DIR ?? "dist"),
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === "test" ? "silent" : "info"),
  };
}

/**
 * No hard-coded secret: when SESSION_SECRET is unset, use a random one kept next to the
 * database (created on first start, mode 0600) so sessions survive restarts.
 */
function loadOrCreateSecret(dataDir: string): string {
  const file = path.join(dataDir, "session-secret");
  try {
    const existing = fs.readFileSync(file, "utf8").trim();
    if (existing.length >= 32) return existing;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== "ENOENT") throw err;
  }
  fs.mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString("base64url");
  fs.writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}
