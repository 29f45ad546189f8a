import { Router } from "express";
import type { ServiceContext } from "../services/context";
import { checkHealth } from "../services/health";

export function healthRouter(ctx: ServiceContext): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    const health = await checkHealth(ctx);
    res.status(health.status === "ok" ? 200 : 503).json(health);
  });
  return router;
}
