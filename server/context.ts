import type { Config } from "./config";
import type { Db } from "./db/database";
import type { Logger } from "./log";

/** Ending sessions from services (password change, disabling a user, admin "sign out everywhere"). */
export interface SessionControl {
  /** Destroys every session of the user except `exceptSid`; returns how many were ended. */
  endSessionsForUser(userId: number, exceptSid?: string): Promise<number>;
}

/** Everything a router or service needs; passed to each `createXRouter(ctx)` factory. */
export interface AppContext {
  config: Config;
  db: Db;
  logger: Logger;
  sessions: SessionControl;
}
