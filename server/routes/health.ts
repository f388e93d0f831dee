import { Router } from "express";
import type { AppContext } from "../context";
import { HttpError } from "../errors";

/** GET /api/health -> 200 { ok: true } when the database answers within 2 s, else 503. */
export function createHealthRouter(ctx: AppContext): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    try {
      await ctx.db.ping(2000);
    } catch {
      throw new HttpError(503, "service_unavailable", "The database is not answering.", undefined, { "Retry-After": "5" });
    }
    res.json({ ok: true });
  });
  return router;
}
