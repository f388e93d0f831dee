import { QueryTypes, Sequelize, Transaction } from "sequelize";
import type { Logger } from "../log";
import { installTransactionContext } from "./cls";
import { migrate } from "./migrate";
import { defineModels, type Models } from "./models";
import { applyPragmasToEveryConnection } from "./pragmas";
import { runStartupChecks } from "./startup-checks";
import { WriteQueue } from "./write-queue";
import { shareOneWriterConnection } from "./writer-connection";

/**
 * The data layer's front door. Routes and services use `db.read` / `db.write`, never
 * `sequelize.transaction` directly:
 *   - `db.write(fn)` queues fn behind every other write and runs it in one IMMEDIATE transaction
 *     (commit when fn resolves, rollback when it throws). Queries inside fn pick the transaction up
 *     automatically; passing `{ transaction: t }` explicitly is still good style.
 *   - `db.read(fn)` runs fn on the shared connection (WAL readers never wait for the writer).
 * With PostgreSQL the queue could become a pass-through without changing callers.
 */
export interface Db {
  sequelize: Sequelize;
  models: Models;
  write<T>(fn: (transaction: Transaction) => Promise<T>): Promise<T>;
  read<T>(fn: () => Promise<T>): Promise<T>;
  /** Resolves when the database answers a trivial query within timeoutMs. */
  ping(timeoutMs?: number): Promise<void>;
  /** Writes queued or running. */
  readonly writeQueueDepth: number;
  sqliteVersion: string;
  appliedMigrations: string[];
  /** Wait for queued writes, then close every connection. */
  close(): Promise<void>;
}

export interface OpenDatabaseOptions {
  storage: string;
  logger: Logger;
}

export async function openDatabase({ storage, logger }: OpenDatabaseOptions): Promise<Db> {
  installTransactionContext();
  const sequelize = new Sequelize({
    dialect: "sqlite",
    storage,
    logging: false,
    // Any transaction opened outside the queue (scripts) still takes the write lock up front.
    transactionType: Transaction.TYPES.IMMEDIATE,
  });
  applyPragmasToEveryConnection(sequelize);
  shareOneWriterConnection(sequelize);

  try {
    const { sqliteVersion } = await runStartupChecks(sequelize);
    const queue = new WriteQueue(sequelize);
    const appliedMigrations = await migrate(sequelize, queue, logger);
    const models = defineModels(sequelize);

    return {
      sequelize,
      models,
      write: (fn) => queue.run(fn),
      read: (fn) => fn(),
      async ping(timeoutMs = 2000) {
        let timer: NodeJS.Timeout | undefined;
        const timeout = new Promise<never>((_, reject) => {
          timer = setTimeout(() => reject(new Error("database ping timed out")), timeoutMs);
        });
        try {
          await Promise.race([sequelize.query("SELECT 1", { type: QueryTypes.SELECT }), timeout]);
        } finally {
          clearTimeout(timer);
        }
      },
      get writeQueueDepth() {
        return queue.depth;
      },
      sqliteVersion,
      appliedMigrations,
      async close() {
        await queue.drain();
        await sequelize.close();
      },
    };
  } catch (err) {
    await sequelize.close().catch(() => undefined);
    throw err;
  }
}
