import { Router } from "express";
import type { MeSummary } from "../../shared/api/me";
import type { AppContext } from "../context";
import { currentUser, requireAuth } from "../middleware/authorize";
import { getMeSummary } from "../services/summary";

export function createMeRouter(ctx: AppContext): Router {
  const router = Router();

  // GET /api/me/summary -> MeSummary for the signed-in user's role.
  router.get("/summary", requireAuth, async (req, res) => {
    const body: MeSummary = await getMeSummary(ctx.db, currentUser(req));
    res.json(body);
  });

  return router;
}
