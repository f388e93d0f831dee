import { QueryTypes, type Sequelize } from "sequelize";

/** SQLite before 3.52.0 has the WAL-reset corruption bug (shared/guides/reliability.md §3, S19). */
export const MIN_SQLITE_VERSION = "3.52.0";

function versionAtLeast(actual: string, min: string): boolean {
  const a = actual.split(".").map(Number);
  const b = min.split(".").map(Number);
  for (let i = 0; i < 3; i++) {
    if ((a[i] ?? 0) !== (b[i] ?? 0)) return (a[i] ?? 0) > (b[i] ?? 0);
  }
  return true;
}

/**
 * Run before serving: SQLite version, WAL journal mode (persisted in the file), quick_check.
 * Throws with a readable message; the process should not start on a damaged or unsuitable database.
 */
export async function runStartupChecks(sequelize: Sequelize): Promise<{ sqliteVersion: string }> {
  const [{ v: sqliteVersion }] = await sequelize.query<{ v: string }>("SELECT sqlite_version() AS v", {
    type: QueryTypes.SELECT,
  });
  if (!versionAtLeast(sqliteVersion, MIN_SQLITE_VERSION)) {
    throw new Error(
      `SQLite ${sqliteVersion} is too old (need >= ${MIN_SQLITE_VERSION} for the WAL-reset fix). ` +
        "Rebuild sqlite3 with its bundled SQLite: npm rebuild sqlite3",
    );
  }

  const [mode] = await sequelize.query<{ journal_mode: string }>("PRAGMA journal_mode = WAL", {
    type: QueryTypes.SELECT,
  });
  if (mode?.journal_mode?.toLowerCase() !== "wal") {
    throw new Error(
      `Could not switch the database to WAL mode (got "${mode?.journal_mode}"). ` +
        "Keep DATABASE_PATH on a local disk, not a network filesystem.",
    );
  }

  const check = await sequelize.query<{ quick_check: string }>("PRAGMA quick_check", { type: QueryTypes.SELECT });
  const problems = check.map((r) => r.quick_check).filter((r) => r !== "ok");
  if (problems.length > 0) {
    throw new Error(`Database failed PRAGMA quick_check: ${problems.slice(0, 5).join("; ")}`);
  }
  return { sqliteVersion };
}
