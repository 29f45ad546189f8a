import { Router, type RequestHandler } from "express";
import multer from "multer";
import {
  ApprovalInputSchema,
  CopyInputSchema,
  ImportQuerySchema,
  MATERIAL_CSV_MAX_BYTES,
  MaterialListQuerySchema,
  MaterialParamsSchema,
  MaterialVersionInputSchema,
  MaterialVersionParamsSchema,
  ProposeVersionInputSchema,
  RetireInputSchema,
} from "../../shared/schemas/material";
import { AppError, invalidInput } from "../errors";
import { actorOf, requirePermission } from "../middleware/require-permission";
import { parseInput } from "../middleware/validate";
import type { ServiceContext } from "../services/context";
import * as csv from "../services/material-csv";
import * as materials from "../services/materials";

const MAX_MB = MATERIAL_CSV_MAX_BYTES / (1024 * 1024);

/**
 * One CSV in memory under the size limit. Multer's own errors become messages that say what to
 * send instead; it runs after the permission check so a refused role never uploads anything.
 */
const receiveCsv: RequestHandler = (req, res, next) => {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MATERIAL_CSV_MAX_BYTES, files: 1, fields: 10, parts: 12 } }).single("file");
  upload(req, res, (error: unknown) => {
    if (!error) return next();
    if (error instanceof multer.MulterError) {
      if (error.code === "LIMIT_FILE_SIZE") return next(new AppError(413, "too_large", `The file is larger than the ${MAX_MB} MB limit for a library import. Split it into smaller files.`));
      if (error.code === "LIMIT_UNEXPECTED_FILE") return next(invalidInput(`Send the CSV as the multipart field "file" (got "${error.field ?? "?"}"), one file per request.`, [{ path: "file", message: "one CSV in the field file" }]));
      return next(invalidInput(`The upload was refused (${error.message}). Send one CSV as the multipart field "file".`, [{ path: "file", message: error.message }]));
    }
    next(error);
  });
};

export function materialsRouter(ctx: ServiceContext): Router {
  const router = Router();

  // Fixed paths first, so "export.csv" and "import" are never read as entry ids.
  router.get("/export.csv", requirePermission("read:material"), async (req, res) => {
    const body = await csv.exportMaterialsCsv(ctx, actorOf(req), parseInput(MaterialListQuerySchema, req.query, "query"));
    const day = ctx.clock().toISOString().slice(0, 10);
    res.setHeader("Content-Type", "text/csv; charset=utf-8");
    res.setHeader("Content-Disposition", `attachment; filename="frostfold-library-${day}.csv"`);
    res.send(body);
  });

  router.post("/import", requirePermission("propose:material"), receiveCsv, async (req, res) => {
    const { dryRun } = parseInput(ImportQuerySchema, req.query, "query");
    if (!req.file) throw invalidInput('Attach the CSV as the multipart field "file".', [{ path: "file", message: "a CSV file is required" }]);
    const outcome = await csv.importMaterialsCsv(ctx, actorOf(req), req.file.buffer, dryRun);
    if ("preview" in outcome) res.json(outcome.preview);
    else res.status(201).json(outcome.result);
  });

  router.get("/", requirePermission("read:material"), async (req, res) => {
    res.json(await materials.listMaterials(ctx, actorOf(req), parseInput(MaterialListQuerySchema, req.query, "query")));
  });

  router.post("/", requirePermission("propose:material"), async (req, res) => {
    res.status(201).json(await materials.createMaterial(ctx, actorOf(req), parseInput(MaterialVersionInputSchema, req.body)));
  });

  router.get("/:id", requirePermission("read:material"), async (req, res) => {
    const { id } = parseInput(MaterialParamsSchema, req.params, "path");
    res.json(await materials.getMaterial(ctx, actorOf(req), id));
  });

  router.get("/:id/versions/:version", requirePermission("read:material"), async (req, res) => {
    const { id, version } = parseInput(MaterialVersionParamsSchema, req.params, "path");
    res.json(await materials.getMaterialVersion(ctx, actorOf(req), id, version));
  });

  router.post("/:id/versions", requirePermission("propose:material"), async (req, res) => {
    const { id } = parseInput(MaterialParamsSchema, req.params, "path");
    res.status(201).json(await materials.proposeVersion(ctx, actorOf(req), id, parseInput(ProposeVersionInputSchema, req.body)));
  });

  router.put("/:id/versions/:version", requirePermission("propose:material"), async (req, res) => {
    const { id, version } = parseInput(MaterialVersionParamsSchema, req.params, "path");
    res.json(await materials.replaceDraft(ctx, actorOf(req), id, version, parseInput(MaterialVersionInputSchema, req.body)));
  });

  router.post("/:id/approval", requirePermission("approve:material"), async (req, res) => {
    const { id } = parseInput(MaterialParamsSchema, req.params, "path");
    res.json(await materials.decideDraft(ctx, actorOf(req), id, parseInput(ApprovalInputSchema, req.body)));
  });

  router.post("/:id/retire", requirePermission("retire:material"), async (req, res) => {
    const { id } = parseInput(MaterialParamsSchema, req.params, "path");
    const { comment } = parseInput(RetireInputSchema, req.body);
    res.json(await materials.retireMaterial(ctx, actorOf(req), id, comment ?? null));
  });

  router.post("/:id/copy", requirePermission("propose:material"), async (req, res) => {
    const { id } = parseInput(MaterialParamsSchema, req.params, "path");
    const { name } = parseInput(CopyInputSchema, req.body);
    res.status(201).json(await materials.copyMaterial(ctx, actorOf(req), id, name));
  });

  return router;
}
