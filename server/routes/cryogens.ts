import { Router } from "express";
import { actorOf, requirePermission } from "../middleware/require-permission";
import type { ServiceContext } from "../services/context";
import { listCryogens } from "../services/materials";

/** Cryogens are library entries of kind cryogen; this is the read-only view designs pick from. */
export function cryogensRouter(ctx: ServiceContext): Router {
  const router = Router();
  router.get("/", requirePermission("read:material"), async (req, res) => {
    res.json(await listCryogens(ctx, actorOf(req)));
  });
  return router;
}
