import { AsyncLocalStorage } from "node:async_hooks";
import { Transaction, type Sequelize } from "sequelize";
import { asQueuedWrite } from "./writer-connection";

/**
 * The single in-process write queue. SQLite allows one writer at a time; letting transactions
 * race for the lock makes them wait inside SQLite's busy handler on libuv pool threads and fail
 * with SQLITE_BUSY under load (measured: 15 of 16 concurrent DEFERRED transactions failed, see
 * shared/guides/reliability.md §3). Here writes run strictly one after another, each in its own
 * `BEGIN IMMEDIATE` transaction, so the lock is taken up front and never upgraded.
 *
 * A write that calls `run` again from inside its callback joins the outer transaction instead of
 * queueing behind itself (which would deadlock). On PostgreSQL this class can become a pass-through.
 */
export class WriteQueue {
  private tail: Promise<unknown> = Promise.resolve();
  private readonly current = new AsyncLocalStorage<Transaction>();
  private waiting = 0;
  private closed = false;

  constructor(private readonly sequelize: Sequelize) {}

  /** Number of writes queued or running. */
  get depth(): number {
    return this.waiting;
  }

  run<T>(fn: (transaction: Transaction) => Promise<T>): Promise<T> {
    const outer = this.current.getStore();
    if (outer && !(outer as unknown as { finished?: string }).finished) return fn(outer);
    if (this.closed) return Promise.reject(new Error("The database is closing; no new writes are accepted."));

    this.waiting += 1;
    const task = this.tail.then(() =>
      asQueuedWrite(() => this.sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, (t) => this.current.run(t, () => fn(t)))),
    );
    const settled = task.finally(() => {
      this.waiting -= 1;
    });
    // The chain continues whether this write succeeded or failed.
    this.tail = settled.catch(() => undefined);
    return settled;
  }

  /** Stop accepting writes and wait for the queued ones to finish. */
  async drain(): Promise<void> {
    this.closed = true;
    await this.tail;
  }
}
