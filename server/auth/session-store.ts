import connectSessionSequelize from "connect-session-sequelize";
import session, { type SessionData } from "express-session";
import { Op } from "sequelize";
import type { Db } from "../db/database";

const SequelizeStore = connectSessionSequelize(session.Store);
type Callback = (err?: unknown, value?: unknown) => void;

/**
 * connect-session-sequelize over our Sessions table, with every write routed through the write
 * queue (the stock store writes on the shared connection, outside it) and two fixes:
 *  - get() ignores expired rows (the stock store only deletes them every 15 minutes);
 *  - touch() (rolling cookie) writes at most once per `touchIntervalMs` per session, so a busy
 *    signed-in user does not cost a write transaction per request. The stored expiry can lag the
 *    cookie by that interval, i.e. the idle timeout is enforced to within a minute.
 * Rows carry userId so all of a user's sessions can be ended at once.
 */
export class QueuedSessionStore extends SequelizeStore {
  private readonly lastTouch = new Map<string, number>();

  constructor(
    private readonly database: Db,
    private readonly touchIntervalMs = 60_000,
  ) {
    super({ db: database.sequelize, table: "Session", checkExpirationInterval: 15 * 60_000 });
    // Declared as a property (not a method) in the package's types, so assign it here.
    this.touch = (sid: string, data: SessionData, cb?: Callback) => {
      const now = Date.now();
      if (now - (this.lastTouch.get(sid) ?? 0) < this.touchIntervalMs) return cb?.();
      this.rememberTouch(sid, now);
      const expires = expiryOf(data);
      this.database
        .write((t) => this.database.models.Session.update({ expires }, { where: { sid }, transaction: t }))
        .then(() => cb?.(), (err) => cb?.(err));
    };
  }

  override get(sid: string, cb: (err: unknown, session?: SessionData | null) => void): void {
    this.database
      .read(() => this.database.models.Session.findOne({ where: { sid, expires: { [Op.gt]: new Date() } } }))
      .then((row) => cb(null, row ? (JSON.parse(row.data) as SessionData) : null), (err) => cb(err));
  }

  override set(sid: string, data: SessionData, cb?: Callback): void {
    const userId = data.passport?.user ?? null;
    this.rememberTouch(sid, Date.now());
    this.database
      .write((t) =>
        this.database.models.Session.upsert(
          { sid, data: JSON.stringify(data), expires: expiryOf(data), userId },
          { transaction: t },
        ),
      )
      .then(() => cb?.(), (err) => cb?.(err));
  }

  override destroy(sid: string, cb?: Callback): void {
    this.lastTouch.delete(sid);
    this.database
      .write((t) => this.database.models.Session.destroy({ where: { sid }, transaction: t }))
      .then(() => cb?.(), (err) => cb?.(err));
  }

  /** Called by the base class every 15 minutes. */
  clearExpiredSessions(cb?: Callback): Promise<void> {
    return this.database
      .write((t) => this.database.models.Session.destroy({ where: { expires: { [Op.lt]: new Date() } }, transaction: t }))
      .then(() => cb?.(), (err) => cb?.(err));
  }

  /** End every session of a user, except (optionally) the one making the request. */
  async endSessionsForUser(userId: number, exceptSid?: string): Promise<number> {
    return this.database.write((t) =>
      this.database.models.Session.destroy({
        where: { userId, ...(exceptSid ? { sid: { [Op.ne]: exceptSid } } : {}) },
        transaction: t,
      }),
    );
  }

  close(): void {
    this.stopExpiringSessions();
    this.lastTouch.clear();
  }

  private rememberTouch(sid: string, now: number): void {
    this.lastTouch.set(sid, now);
    if (this.lastTouch.size > 50_000) {
      for (const [key, at] of this.lastTouch) if (now - at >= this.touchIntervalMs) this.lastTouch.delete(key);
    }
  }
}

function expiryOf(data: SessionData): Date {
  const expires = data.cookie?.expires ? new Date(data.cookie.expires) : null;
  return expires && !Number.isNaN(expires.getTime()) ? expires : new Date(Date.now() + 24 * 3_600_000);
}
