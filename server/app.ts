import express, { Router, type Express } from "express";
import { createCredentialChecker } from "./auth/credentials";
import { csrfProtection } from "./auth/csrf";
import { createPassport } from "./auth/passport";
import { createSession, enforceAbsoluteTimeout } from "./auth/session";
import type { Config } from "./config";
import type { AppContext } from "./context";
import { openDatabase, type Db } from "./db/database";
import { seedDemoIfEmpty } from "./db/seed/demo";
import { createLogger, type Logger } from "./log";
import { closeTeachingRuntime } from "./mail/runtime";
import { apiNotFound, errorHandler } from "./middleware/error-handler";
import { noStore, rejectCrossSite, requireJsonBody } from "./middleware/request-guards";
import { securityHeaders } from "./middleware/security-headers";
import { allowsMultipart } from "./policy";
import { createClientRouter } from "./routes/client";
import { createHealthRouter } from "./routes/health";
import { apiRouters } from "./routes/index";
import { closeBillingRuntime } from "./billing/runtime";
import { createBillingWebhookRouter } from "./routes/billing";

export interface GrainEdgeApp {
  app: Express;
  db: Db;
  config: Config;
  logger: Logger;
  /** Stop timers and close the database (after the HTTP server has stopped accepting requests). */
  close(): Promise<void>;
}

/**
 * Build the whole product (API + built client) from a config, without listening. Opens the
 * database, applies migrations, seeds the demo school when asked and the database has no users.
 * Tests call this with a temporary DATABASE_PATH; server/index.ts calls it and listens.
 */
export async function createApp(config: Config, options: { logger?: Logger } = {}): Promise<GrainEdgeApp> {
  const logger = options.logger ?? createLogger(config.logLevel);
  const db = await openDatabase({ storage: config.databasePath, logger });
  try {
    if (config.seedDemo) await seedDemoIfEmpty(db, logger);

    const session = createSession(config, db);
    const ctx: AppContext = { config, db, logger, sessions: session.store };
    const checkCredentials = createCredentialChecker(ctx);
    const passport = createPassport(ctx, checkCredentials);

    const app = express();
    app.disable("x-powered-by");
    app.set("trust proxy", config.trustProxy);
    app.use(securityHeaders(config.cookieSecure));

    const api = Router();
    api.use(noStore);
    // Health first: no session, no body.
    api.use("/health", createHealthRouter(ctx));
    // Payment provider webhook: authenticated by its signature over the raw body, so before session/CSRF/JSON.
    api.use("/billing/webhook", createBillingWebhookRouter(ctx));
    // Who is asking: session cookie -> session row -> user re-read from the database.
    api.use(session.middleware, passport.session(), enforceAbsoluteTimeout(config.session.absoluteTimeoutMs));
    // Unsafe requests: same-site only, CSRF token, JSON bodies only (<= 100 kB).
    api.use(rejectCrossSite(config.allowedOrigins), csrfProtection);
    api.use(requireJsonBody((req) => allowsMultipart(req.method, req.baseUrl + req.path)));
    api.use(express.json({ limit: "100kb" }));
    for (const [mountPath, router] of apiRouters(ctx, { passport, store: session.store, cookieName: session.cookieName, checkCredentials })) {
      api.use(mountPath, router);
    }
    api.use(apiNotFound);
    app.use("/api", api);

    // Everything else is the client app.
    app.use(createClientRouter(config.clientDistDir));
    app.use((_req, res) => {
      res.status(404).type("text/plain").send("Not found");
    });
    app.use(errorHandler(logger));

    return {
      app,
      db,
      config,
      logger,
      async close() {
        // Background jobs and mail first (they still write), then the session store's timer,
        // then the database (which waits for queued writes).
        await closeTeachingRuntime(db);
        await closeBillingRuntime(db); // the fake payment service's port
        session.store.close();
        await db.close();
      },
    };
  } catch (err) {
    await closeTeachingRuntime(db).catch(() => undefined);
    await closeBillingRuntime(db).catch(() => undefined);
    await db.close().catch(() => undefined);
    throw err;
  }
}
