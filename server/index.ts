import "./env-preload";
import type { AddressInfo } from "node:net";
import { createApp } from "./app";
import { loadConfig } from "./config";

/** Start the product: load config, build the app, listen, shut down cleanly on SIGTERM/SIGINT. */
async function main(): Promise<void> {
  const config = loadConfig(process.env);
  const { app, close, logger } = await createApp(config);

  const server = app.listen(config.port, config.host ?? "0.0.0.0");
  await new Promise<void>((resolve, reject) => {
    server.once("listening", resolve);
    server.once("error", reject);
  });
  const { port } = server.address() as AddressInfo;
  const shownHost = config.host && config.host !== "0.0.0.0" ? config.host : "localhost";
  logger.info("listening", { port, database: config.databasePath, nodeEnv: config.nodeEnv });
  console.log(`Grain & Edge is running on http://${shownHost}:${port}`);

  let stopping = false;
  // A response finished while stopping leaves an idle keep-alive socket that would hold the
  // server open until keepAliveTimeout: close such sockets as soon as they become idle.
  server.on("request", (_req, res) => {
    res.once("finish", () => {
      if (stopping) setImmediate(() => server.closeIdleConnections());
    });
  });
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    // Stop accepting connections, let in-flight requests finish, then stop the background jobs
    // and close the database (queued writes complete first). Exit 0 when all of that succeeded.
    server.close(() => {
      close().then(
        () => {
          logger.info("stopped", { signal });
          process.exit(0);
        },
        (err) => {
          logger.error("error while closing the database", { error: String(err) });
          process.exit(1);
        },
      );
    });
    server.closeIdleConnections();
    // Logged once the listening socket is closed: from here on new connections are refused.
    logger.info("shutting down", { signal });
    // Do not hang forever on a stuck client (a request that never completes).
    setTimeout(() => {
      logger.error("forced exit after 10 s");
      process.exit(1);
    }, 10_000).unref();
  };
  process.on("SIGTERM", () => stop("SIGTERM"));
  process.on("SIGINT", () => stop("SIGINT"));
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
