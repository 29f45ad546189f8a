import { rm } from "node:fs/promises";
import { pipeline } from "node:stream/promises";
import { Router, type Request, type RequestHandler } from "express";
import multer from "multer";
import {
  AttachmentParamsSchema,
  CreateTestInputSchema,
  LogUploadFieldsSchema,
  PatchTestInputSchema,
  TestListQuerySchema,
  TestParamsSchema,
  WindowInputSchema,
} from "../../shared/schemas/boil-off-test";
import { AppError, invalidInput } from "../errors";
import { actorOf, requirePermission } from "../middleware/require-permission";
import { parseInput } from "../middleware/validate";
import * as tests from "../services/boil-off-tests";
import type { ServiceContext } from "../services/context";
import type { UploadedFile } from "../services/logger-files";
import { addAttachment, getAttachment } from "../services/test-attachments";
import * as logs from "../services/test-logs";

/**
 * One file to a temporary folder on disk (never into memory: logs reach 200 MB), under the size
 * limit, after the permission check so a refused role uploads nothing. The temporary file is
 * removed when the response ends, whatever happened. Browsers send filenames as UTF-8, not
 * busboy's default latin1.
 */
function receiveFile(maxBytes: number, what: string): RequestHandler {
  const upload = multer({ storage: multer.diskStorage({}), defParamCharset: "utf8", limits: { fileSize: maxBytes, files: 1, fields: 20, parts: 21 } }).single("file");
  const limit = maxBytes >= 1024 * 1024 ? `${Number((maxBytes / (1024 * 1024)).toFixed(1))} MB` : `${Number((maxBytes / 1024).toFixed(1))} KB`;
  return (req, res, next) => {
    res.on("close", () => {
      if (req.file?.path) void rm(req.file.path, { force: true });
    });
    upload(req, res, (error: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError) {
        if (error.code === "LIMIT_FILE_SIZE") return next(new AppError(413, "too_large", `The file is larger than the ${limit} limit for ${what}. Split it into smaller files.`, [{ path: "file", message: `at most ${limit}` }]));
        if (error.code === "LIMIT_UNEXPECTED_FILE") return next(invalidInput(`Send ${what} as the multipart field "file" (got "${error.field ?? "?"}"), one file per request.`, [{ path: "file", message: "one file in the field file" }]));
        return next(invalidInput(`The upload was refused (${error.message}). Send one file as the multipart field "file".`, [{ path: "file", message: error.message }]));
      }
      next(error);
    });
  };
}

function uploaded(req: Request, what: string): UploadedFile {
  if (!req.file) throw invalidInput(`Attach ${what} as the multipart field "file".`, [{ path: "file", message: "a file is required" }]);
  return { path: req.file.path, originalName: req.file.originalname, size: req.file.size };
}

export function boilOffTestsRouter(ctx: ServiceContext): Router {
  const router = Router();
  const receiveLog = receiveFile(ctx.env.LOG_MAX_BYTES, "a logger file");
  const receiveAttachment = receiveFile(ctx.env.ATTACHMENT_MAX_BYTES, "an attachment");

  router.get("/", requirePermission("read:test"), async (req, res) => {
    res.json({ tests: await tests.listTests(ctx, actorOf(req), parseInput(TestListQuerySchema, req.query, "query")) });
  });

  router.post("/", requirePermission("create:test"), async (req, res) => {
    res.status(201).json(await tests.createTest(ctx, actorOf(req), parseInput(CreateTestInputSchema, req.body)));
  });

  router.get("/:id", requirePermission("read:test"), async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.json(await tests.getTest(ctx, actorOf(req), id));
  });

  router.patch("/:id", requirePermission("comment:test"), async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.json(await tests.updateTest(ctx, actorOf(req), id, parseInput(PatchTestInputSchema, req.body)));
  });

  router.delete("/:id", requirePermission("delete:test"), async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    await tests.deleteTest(ctx, actorOf(req), id);
    res.status(204).end();
  });

  router.post("/:id/logs/preview", requirePermission("create:test"), receiveLog, async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.json(await logs.previewLog(ctx, actorOf(req), id, uploaded(req, "the logger file")));
  });

  router.post("/:id/logs", requirePermission("create:test"), receiveLog, async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    const fields = parseInput(LogUploadFieldsSchema, req.body, "form");
    res.status(201).json(await logs.ingestLog(ctx, actorOf(req), id, uploaded(req, "the logger file"), fields));
  });

  router.put("/:id/window", requirePermission("create:test"), async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.json(await logs.setWindow(ctx, actorOf(req), id, parseInput(WindowInputSchema, req.body)));
  });

  router.delete("/:id/window", requirePermission("create:test"), async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.json(await logs.setWindow(ctx, actorOf(req), id, null));
  });

  router.get("/:id/analysis", requirePermission("read:test"), async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.json(await logs.getAnalysis(ctx, actorOf(req), id));
  });

  router.get("/:id/series", requirePermission("read:test"), async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.json(await logs.getSeries(ctx, actorOf(req), id));
  });

  router.post("/:id/accept", requirePermission("create:test"), async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.json(await tests.acceptTest(ctx, actorOf(req), id));
  });

  router.post("/:id/attachments", requirePermission("create:test"), receiveAttachment, async (req, res) => {
    const { id } = parseInput(TestParamsSchema, req.params, "path");
    res.status(201).json(await addAttachment(ctx, actorOf(req), id, uploaded(req, "the attachment")));
  });

  router.get("/:id/attachments/:attachmentId", requirePermission("read:test"), async (req, res) => {
    const { id, attachmentId } = parseInput(AttachmentParamsSchema, req.params, "path");
    const file = await getAttachment(ctx, actorOf(req), id, attachmentId);
    res.type(file.contentType).attachment(file.filename).setHeader("Content-Length", String(file.size));
    await pipeline(file.body, res);
  });

  return router;
}
