import { Router, type Response } from "express";
import {
  CompareQuerySchema,
  CreateDesignInputSchema,
  DesignListQuerySchema,
  DesignParamsSchema,
  DuplicateDesignInputSchema,
  EstimateInputSchema,
  RevisionParamsSchema,
  SaveRevisionInputSchema,
  SweepInputSchema,
} from "../../shared/schemas/design";
import { actorOf, requirePermission } from "../middleware/require-permission";
import { parseInput } from "../middleware/validate";
import { compareDesigns } from "../services/compare";
import type { ServiceContext } from "../services/context";
import * as designs from "../services/designs";
import { revisionReport } from "../services/reports";

export function designsRouter(ctx: ServiceContext): Router {
  const router = Router();

  router.get("/", requirePermission("read:design"), async (req, res) => {
    const { q } = parseInput(DesignListQuerySchema, req.query, "query");
    res.json({ designs: await designs.listDesigns(ctx, actorOf(req), q) });
  });

  router.post("/", requirePermission("edit:design"), async (req, res) => {
    res.status(201).json(await designs.createDesign(ctx, actorOf(req), parseInput(CreateDesignInputSchema, req.body)));
  });

  router.get("/:id", requirePermission("read:design"), async (req, res) => {
    const { id } = parseInput(DesignParamsSchema, req.params, "path");
    res.json(await designs.getDesign(ctx, actorOf(req), id));
  });

  router.post("/:id/revisions", requirePermission("edit:design"), async (req, res) => {
    const { id } = parseInput(DesignParamsSchema, req.params, "path");
    res.status(201).json(await designs.saveRevision(ctx, actorOf(req), id, parseInput(SaveRevisionInputSchema, req.body)));
  });

  router.get("/:id/revisions/:rev", requirePermission("read:design"), async (req, res) => {
    const { id, rev } = parseInput(RevisionParamsSchema, req.params, "path");
    res.json(await designs.getRevision(ctx, actorOf(req), id, rev));
  });

  router.get("/:id/revisions/:rev/report.pdf", requirePermission("read:design"), async (req, res) => {
    const { id, rev } = parseInput(RevisionParamsSchema, req.params, "path");
    const { filename, pdf } = await revisionReport(ctx, actorOf(req), id, rev);
    res.type("application/pdf").attachment(filename).send(pdf);
  });

  router.post("/:id/duplicate", requirePermission("edit:design"), async (req, res) => {
    const { id } = parseInput(DesignParamsSchema, req.params, "path");
    const { name } = parseInput(DuplicateDesignInputSchema, req.body);
    res.status(201).json(await designs.duplicateDesign(ctx, actorOf(req), id, name));
  });

  return router;
}

/** Ready JSON bytes, without res.json's stringify or res.send's ETag (which no POST is ever revalidated by). */
function sendJsonBytes(res: Response, json: Buffer) {
  res.setHeader("Content-Type", "application/json; charset=utf-8");
  res.setHeader("Content-Length", json.length);
  res.end(json);
}

/** The stateless estimate behind the live preview, and the side-by-side comparison. */
export function estimateRouter(ctx: ServiceContext): Router {
  const router = Router();
  // Answers come from the estimate memo when the same organization sent the same body under the
  // same library (server/cache/estimate-memo.ts); validation runs whenever the engine does.
  router.post("/estimate", requirePermission("read:design"), async (req, res) => {
    const actor = actorOf(req);
    const json = await ctx.estimateMemo.answer("estimate", actor.organizationId, req.body, async () => {
      const { content, sweep } = parseInput(EstimateInputSchema, req.body);
      return designs.estimate(ctx, actor, content, { sweep });
    });
    sendJsonBytes(res, json);
  });
  router.post("/estimate/sweep", requirePermission("read:design"), async (req, res) => {
    const actor = actorOf(req);
    const json = await ctx.estimateMemo.answer("sweep", actor.organizationId, req.body, async () =>
      designs.sweepEstimate(ctx, actor, parseInput(SweepInputSchema, req.body)),
    );
    sendJsonBytes(res, json);
  });
  router.get("/compare", requirePermission("read:design"), async (req, res) => {
    const { ids, price_per_L } = parseInput(CompareQuerySchema, req.query, "query");
    res.json(await compareDesigns(ctx, actorOf(req), ids, price_per_L));
  });
  return router;
}
