import { initial } from "./0001-initial";
import { savedAlloys } from "./0005-saved-alloys";
import { teaching } from "./0020-teaching";
import { notebook } from "./0040-notebook";
import { selfStudy } from "./0060-self-study";
import type { Migration } from "./types";

/**
 * Every schema change is a migration, applied in this order at startup (never sync({ alter })).
 *
 * HOW TO ADD A MIGRATION
 *   1. Create `server/db/migrations/NNNN-what.ts` exporting a `Migration` ({ name: "NNNN-what", up, down }).
 *      Use `queryInterface` and pass `{ transaction }` (it is also picked up automatically).
 *   2. Append ONE line to MIGRATIONS below. Never edit or reorder a migration that has shipped.
 *   SQLite note: each migration runs inside one transaction with foreign_keys ON, and that pragma
 *   cannot change inside a transaction; for table rebuilds write raw SQL (create new, copy, drop, rename)
 *   and check `PRAGMA foreign_key_check` at the end.
 */
export const MIGRATIONS: readonly Migration[] = [
  initial,
  savedAlloys,
  teaching,
  notebook,
  selfStudy,
];

export type { Migration, MigrationContext } from "./types";
