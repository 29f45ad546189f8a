import { Router } from "express";
import { AlertParamsSchema } from "../../shared/schemas/alert";
import { actorOf, requirePermission } from "../middleware/require-permission";
import { parseInput } from "../middleware/validate";
import * as alerts from "../services/alerts";
import type { ServiceContext } from "../services/context";

/** Open alerts for Overview, and acknowledging one. */
export function alertsRouter(ctx: ServiceContext): Router {
  const router = Router();

  router.get("/", requirePermission("read:test"), async (req, res) => {
    res.json({ alerts: await alerts.listOpenAlerts(ctx, actorOf(req)) });
  });

  router.post("/:id/acknowledge", requirePermission("acknowledge:alert"), async (req, res) => {
    const { id } = parseInput(AlertParamsSchema, req.params, "path");
    res.json(await alerts.acknowledgeAlert(ctx, actorOf(req), id));
  });

  return router;
}
