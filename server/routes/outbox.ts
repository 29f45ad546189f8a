import { Router } from "express";
import { actorOf, requirePermission } from "../middleware/require-permission";
import type { ServiceContext } from "../services/context";
import { listLocalOutbox } from "../services/outbox";

export function outboxRouter(ctx: ServiceContext): Router {
  const router = Router();
  router.get("/", requirePermission("read:outbox"), async (req, res) => {
    res.json({ messages: await listLocalOutbox(ctx, actorOf(req)) });
  });
  return router;
}
