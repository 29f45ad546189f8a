import express, { Router, type RequestHandler, type Response } from "express";
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
import { AppError } from "../errors";
import { actorOf, requirePermission } from "../middleware/require-permission";
import { sessionMiddleware } from "../middleware/session";
import { parseInput } from "../middleware/validate";
import { compareDesigns } from "../services/compare";
import type { Actor, ServiceContext } from "../services/context";
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

/**
 * The stateless estimate behind the live preview. It is mounted before the API's JSON body parser
 * and session (server/app.ts) and reads the body as text, so a body the estimate memo has
 * answered for this organization under this library is never parsed; validation runs whenever
 * the engine does.
 */
export function estimateRouter(ctx: ServiceContext): Router {
  const router = Router();
  const before = [express.text({ type: "application/json", limit: "1mb" }), sessionMiddleware(ctx), requirePermission("read:design")];
  const answer =
    (route: string, compute: (actor: Actor, body: unknown) => Promise<unknown>): RequestHandler =>
    async (req, res) => {
      const actor = actorOf(req);
      const text = typeof req.body === "string" ? req.body : "";
      sendJsonBytes(res, await ctx.estimateMemo.answer(route, actor.organizationId, text, () => compute(actor, parseJsonText(text))));
    };
  router.post(
    "/estimate",
    ...before,
    answer("estimate", (actor, body) => {
      const { content, sweep } = parseInput(EstimateInputSchema, body);
      return designs.estimate(ctx, actor, content, { sweep });
    }),
  );
  router.post(
    "/estimate/sweep",
    ...before,
    answer("sweep", (actor, body) => designs.sweepEstimate(ctx, actor, parseInput(SweepInputSchema, body))),
  );
  return router;
}

/** The side-by-side comparison of saved designs and revisions. */
export function compareRouter(ctx: ServiceContext): Router {
  const router = Router();
  router.get("/compare", requirePermission("read:design"), async (req, res) => {
    const { ids, price_per_L } = parseInput(CompareQuerySchema, req.query, "query");
    res.json(await compareDesigns(ctx, actorOf(req), ids, price_per_L));
  });
  return router;
}

/** An empty body reads as {} (so validation names the missing fields), as the JSON parser does. */
function parseJsonText(text: string): unknown {
  if (text.trim() === "") return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError(400, "invalid_json", "The request body is not valid JSON.");
  }
}
