import type { Sequelize } from "sequelize";
import { Umzug, type UmzugStorage } from "umzug";
import type { Logger } from "../log";
import { MIGRATIONS, type Migration } from "./migrations";
import type { WriteQueue } from "./write-queue";

const META_TABLE = "SequelizeMeta";

/**
 * Apply pending migrations with umzug. Each migration and its SequelizeMeta row are written in ONE
 * IMMEDIATE transaction through the write queue, so a crash mid-migration leaves it un-applied
 * rather than half-applied. (umzug's own logMigration hook is therefore a no-op.)
 */
export async function migrate(
  sequelize: Sequelize,
  queue: WriteQueue,
  logger: Logger,
  migrations: readonly Migration[] = MIGRATIONS,
): Promise<string[]> {
  await queue.run((transaction) =>
    sequelize.query(`CREATE TABLE IF NOT EXISTS ${META_TABLE} (name VARCHAR(255) NOT NULL PRIMARY KEY)`, {
      transaction,
    }),
  );

  const storage: UmzugStorage = {
    async executed() {
      const [rows] = await sequelize.query(`SELECT name FROM ${META_TABLE} ORDER BY name`);
      return (rows as { name: string }[]).map((r) => r.name);
    },
    async logMigration() {},
    async unlogMigration() {},
  };

  const umzug = new Umzug({
    migrations: migrations.map((m) => ({
      name: m.name,
      up: () =>
        queue.run(async (transaction) => {
          await m.up({ queryInterface: sequelize.getQueryInterface(), sequelize, transaction });
          await sequelize.query(`INSERT INTO ${META_TABLE} (name) VALUES (?)`, { replacements: [m.name], transaction });
        }),
      down: () =>
        queue.run(async (transaction) => {
          if (!m.down) throw new Error(`Migration ${m.name} cannot be reverted.`);
          await m.down({ queryInterface: sequelize.getQueryInterface(), sequelize, transaction });
          await sequelize.query(`DELETE FROM ${META_TABLE} WHERE name = ?`, { replacements: [m.name], transaction });
        }),
    })),
    storage,
    logger: undefined,
  });

  const applied = await umzug.up();
  for (const m of applied) logger.info("migration applied", { name: m.name });
  return applied.map((m) => m.name);
}
