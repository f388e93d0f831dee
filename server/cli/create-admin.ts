/**
 * npm run create-admin — create the first administrator of a real deployment (there is no
 * default admin outside the demo seed). Asks for e-mail, display name and password (hidden on a
 * terminal, typed twice). Also works with piped input, one answer per line:
 *   printf 'ada@school.example\nAda Example\nlong-pass-phrase\nlong-pass-phrase\n' | SEED_DEMO=0 npm run create-admin
 * Uses the same DATABASE_PATH as the server and applies pending migrations first.
 */
import "../env-preload";
import readline from "node:readline";
import { z } from "zod";
import { passwordSchema } from "../../shared/api/auth";
import { hashPassword } from "../auth/passwords";
import { normalizeEmail } from "../auth/public-user";
import { loadConfig } from "../config";
import { openDatabase } from "../db/database";
import { createLogger } from "../log";
import { recordAudit } from "../services/audit";

const emailSchema = z.email("Enter a valid e-mail address.").max(254);
const nameSchema = z.string().trim().min(1, "Enter a name.").max(120, "Use at most 120 characters.");

async function main(): Promise<number> {
  const config = loadConfig(process.env);
  const interactive = Boolean(process.stdin.isTTY);
  const rl = readline.createInterface({ input: process.stdin, output: process.stdout, terminal: interactive });
  const lines = rl[Symbol.asyncIterator]();
  let muted = false;
  // Hide typed characters while a password is being entered (terminal only).
  const rlOutput = rl as unknown as { _writeToOutput(s: string): void };
  const writeToOutput = rlOutput._writeToOutput.bind(rl);
  rlOutput._writeToOutput = (s: string) => {
    if (!muted || s === "\r\n" || s === "\n") writeToOutput(s);
  };

  const ask = async (prompt: string, hidden = false): Promise<string> => {
    process.stdout.write(prompt);
    muted = hidden && interactive;
    const next = await lines.next();
    muted = false;
    if (next.done) throw new Error("Input ended before all answers were given.");
    return next.value;
  };
  const askValid = async <T>(prompt: string, schema: z.ZodType<T>, hidden = false): Promise<T> => {
    for (;;) {
      const result = schema.safeParse(await ask(prompt, hidden));
      if (result.success) return result.data;
      console.error(`  ${result.error.issues[0]?.message ?? "Invalid value."}`);
      if (!interactive) throw new Error("Invalid input.");
    }
  };

  const logger = createLogger("warn");
  const db = await openDatabase({ storage: config.databasePath, logger });
  try {
    console.log(`Create an administrator in ${config.databasePath}`);
    const email = normalizeEmail(await askValid("E-mail: ", emailSchema));
    if (await db.models.User.findOne({ where: { email } })) {
      console.error(`A user with the e-mail ${email} already exists.`);
      return 1;
    }
    const displayName = await askValid("Display name: ", nameSchema);
    let password: string;
    for (;;) {
      password = await askValid("Password (8-128 characters): ", passwordSchema, true);
      const again = await ask("Repeat the password: ", true);
      if (again === password) break;
      console.error("  The passwords do not match.");
      if (!interactive) return 1;
    }
    const passwordHash = await hashPassword(password);
    const admin = await db.write(async (t) => {
      const user = await db.models.User.create({ email, displayName, passwordHash, role: "admin" }, { transaction: t });
      await recordAudit(db, { actorId: null, action: "user.admin_created_cli", targetType: "user", targetId: user.id }, t);
      return user;
    });
    console.log(`Administrator ${admin.email} created (id ${admin.id}). Sign in at /sign-in.`);
    return 0;
  } finally {
    rl.close();
    await db.close();
  }
}

main().then(
  (code) => process.exit(code),
  (err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  },
);
