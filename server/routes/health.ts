import { Router } from "express";
import { pingDatabase } from "../db/repositories/health";
import type { ServiceContext } from "../services/context";

export function healthRouter(ctx: ServiceContext): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    const started = performance.now();
    try {
      await pingDatabase(ctx.db);
      res.json({ status: "ok", database: { status: "ok", latency_ms: Math.round((performance.now() - started) * 10) / 10 } });
    } catch {
      res.status(503).json({ status: "degraded", database: { status: "unreachable" } });
    }
  });
  return router;
}
