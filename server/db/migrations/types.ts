import type { QueryInterface, Sequelize, Transaction } from "sequelize";

export interface MigrationContext {
  queryInterface: QueryInterface;
  sequelize: Sequelize;
  /** Each migration runs inside its own IMMEDIATE transaction through the write queue. */
  transaction: Transaction;
}

export interface Migration {
  /** Unique, sortable name, recorded in SequelizeMeta; e.g. "0002-lessons". Never rename once shipped. */
  name: string;
  up(ctx: MigrationContext): Promise<void>;
  down?(ctx: MigrationContext): Promise<void>;
}
