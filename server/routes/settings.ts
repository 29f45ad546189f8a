import { Router } from "express";
import { AlertSettingsSchema } from "../../shared/schemas/alert";
import { actorOf, requirePermission } from "../middleware/require-permission";
import { parseInput } from "../middleware/validate";
import type { ServiceContext } from "../services/context";
import * as settings from "../services/settings";

/** Organization settings; for now the alert threshold. */
export function settingsRouter(ctx: ServiceContext): Router {
  const router = Router();

  router.get("/alerts", requirePermission("read:organization"), async (req, res) => {
    res.json(await settings.getAlertSettings(ctx, actorOf(req)));
  });

  router.put("/alerts", requirePermission("edit:settings"), async (req, res) => {
    res.json(await settings.setAlertSettings(ctx, actorOf(req), parseInput(AlertSettingsSchema, req.body)));
  });

  return router;
}
