import { Router } from "express";
import { ApplyCalibrationInputSchema } from "../../shared/schemas/boil-off-test";
import { DesignParamsSchema } from "../../shared/schemas/design";
import { actorOf, requirePermission } from "../middleware/require-permission";
import { parseInput } from "../middleware/validate";
import * as calibration from "../services/calibration";
import type { ServiceContext } from "../services/context";

/** Mounted at /api/designs beside the designs router: a design's calibration from its accepted tests. */
export function calibrationRouter(ctx: ServiceContext): Router {
  const router = Router();

  router.get("/:id/calibration", requirePermission("read:design"), async (req, res) => {
    const { id } = parseInput(DesignParamsSchema, req.params, "path");
    res.json(await calibration.getCalibration(ctx, actorOf(req), id));
  });

  router.post("/:id/calibration/apply", requirePermission("edit:design"), async (req, res) => {
    const { id } = parseInput(DesignParamsSchema, req.params, "path");
    const { baseRevision } = parseInput(ApplyCalibrationInputSchema, req.body);
    res.status(201).json(await calibration.applyCalibration(ctx, actorOf(req), id, baseRevision));
  });

  return router;
}
