import type { Sequelize } from "sequelize";

/** Pragmas every SQLite connection needs (they are per connection, not stored in the file). */
export const CONNECTION_PRAGMAS = {
  /** Wait for the write lock instead of failing at once with SQLITE_BUSY. */
  busy_timeout: 5000,
  /** FULL: in WAL mode every commit is synced, so acknowledged grades survive power loss. */
  synchronous: "FULL",
  foreign_keys: "ON",
} as const;

const PRAGMA_SQL = Object.entries(CONNECTION_PRAGMAS)
  .map(([name, value]) => `PRAGMA ${name} = ${value};`)
  .join("\n");

interface RawConnection {
  exec(sql: string, cb: (err: Error | null) => void): void;
}

/**
 * Sequelize 6 over sqlite3 shares one "default" connection for plain queries but opens a NEW
 * connection for each transaction, and `afterConnect` hooks do not run on that path. Pragmas set
 * with `sequelize.query` therefore only reach the default connection. So we wrap the dialect's
 * `getConnection` and run the pragmas once on every connection it hands out, before any query
 * uses it. Concurrent callers for the same connection await the same promise.
 */
export function applyPragmasToEveryConnection(sequelize: Sequelize): void {
  const manager = sequelize.connectionManager as unknown as {
    getConnection(options?: unknown): Promise<RawConnection>;
  };
  const original = manager.getConnection.bind(manager);
  const prepared = new WeakMap<RawConnection, Promise<void>>();

  manager.getConnection = async (options?: unknown) => {
    const connection = await original(options);
    let ready = prepared.get(connection);
    if (!ready) {
      ready = new Promise<void>((resolve, reject) =>
        connection.exec(PRAGMA_SQL, (err) => (err ? reject(err) : resolve())),
      );
      prepared.set(connection, ready);
    }
    await ready;
    return connection;
  };
}
