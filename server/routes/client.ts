import fs from "node:fs";
import path from "node:path";
import express, { Router } from "express";

/**
 * The built client (vite build -> dist/). Hashed files under /assets/ are cached for a year;
 * everything else, including index.html, is revalidated. Every other GET path that is not a file
 * gets index.html (the client router decides what to show, including its not-found page).
 */
export function createClientRouter(distDir: string): Router {
  const router = Router();
  const indexFile = path.join(distDir, "index.html");

  router.use(
    express.static(distDir, {
      index: false,
      redirect: false,
      setHeaders(res, filePath) {
        const rel = path.relative(distDir, filePath).split(path.sep);
        res.setHeader("Cache-Control", rel[0] === "assets" ? "public, max-age=31536000, immutable" : "no-cache");
      },
    }),
  );

  router.get("/{*splat}", (_req, res) => {
    if (!fs.existsSync(indexFile)) {
      res.status(503).type("text/plain").send("The client has not been built yet. Run `npm run build` (or `npm start`).");
      return;
    }
    res.setHeader("Cache-Control", "no-cache");
    res.sendFile(indexFile);
  });

  return router;
}
