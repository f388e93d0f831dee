import { AsyncLocalStorage } from "node:async_hooks";
import { Sequelize } from "sequelize";

/**
 * Sequelize 6 can pass the current transaction to every query inside a `sequelize.transaction(cb)`
 * callback automatically ("CLS"). It expects a cls-hooked namespace; this is the small subset it
 * calls (run/bind/get/set), backed by Node's AsyncLocalStorage. With it, a query inside
 * `db.write(fn)` that forgets `{ transaction }` still runs on the transaction's connection instead
 * of waiting for the write lock that its own transaction holds.
 *
 * Sequelize keeps the namespace globally (all instances in the process), which is fine: each
 * context only lives for one transaction callback.
 */
type Context = Map<string, unknown>;
const storage = new AsyncLocalStorage<Context>();

const namespace = {
  run(fn: (ctx: Context) => unknown) {
    const ctx: Context = new Map(storage.getStore());
    storage.run(ctx, () => fn(ctx));
    return ctx;
  },
  runAndReturn<T>(fn: (ctx: Context) => T): T {
    const ctx: Context = new Map(storage.getStore());
    return storage.run(ctx, () => fn(ctx));
  },
  bind<F extends (...args: unknown[]) => unknown>(fn: F, ctx?: Context): F {
    const bound = ctx ?? storage.getStore();
    if (!bound) return fn;
    return ((...args: unknown[]) => storage.run(bound, () => fn(...args))) as F;
  },
  get(key: string): unknown {
    return storage.getStore()?.get(key);
  },
  set<T>(key: string, value: T): T {
    storage.getStore()?.set(key, value);
    return value;
  },
};

let installed = false;
export function installTransactionContext(): void {
  if (installed) return;
  Sequelize.useCLS(namespace as unknown as Parameters<typeof Sequelize.useCLS>[0]);
  installed = true;
}
