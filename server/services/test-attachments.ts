import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import { open } from "node:fs/promises";
import type { Readable } from "node:stream";
import type { StoredFile } from "../../shared/schemas/boil-off-test";
import { insertAuditEntry } from "../db/repositories/audit";
import * as repo from "../db/repositories/boil-off-tests";
import { AppError, notFound } from "../errors";
import { newId } from "../ids";
import { loadTest } from "./boil-off-tests";
import type { Actor, ServiceContext } from "./context";
import type { UploadedFile } from "./logger-files";

/**
 * Photos and PDFs beside a test (the vessel's plate, the scale's calibration sheet). The type
 * comes from the file's first bytes, not from the name or the browser's claim, so a download
 * is always served as what it really is.
 */
const SIGNATURES: { type: string; matches: (b: Buffer) => boolean }[] = [
  { type: "image/png", matches: (b) => b.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) },
  { type: "image/jpeg", matches: (b) => b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff },
  { type: "image/webp", matches: (b) => b.toString("ascii", 0, 4) === "RIFF" && b.toString("ascii", 8, 12) === "WEBP" },
  { type: "application/pdf", matches: (b) => b.toString("ascii", 0, 5) === "%PDF-" },
];

async function sniff(path: string): Promise<string | null> {
  const handle = await open(path, "r");
  try {
    const head = Buffer.alloc(16);
    const { bytesRead } = await handle.read(head, 0, 16, 0);
    return SIGNATURES.find((s) => s.matches(head.subarray(0, bytesRead)))?.type ?? null;
  } finally {
    await handle.close();
  }
}

async function sha256Of(path: string): Promise<string> {
  const hash = createHash("sha256");
  for await (const chunk of createReadStream(path)) hash.update(chunk as Buffer);
  return hash.digest("hex");
}

/** Names are kept for the download's filename only; path parts and control characters are dropped. */
export const safeFilename = (name: string, fallback: string) =>
  // eslint-disable-next-line no-control-regex -- control characters are exactly what is dropped
  (name.split(/[\\/]/).pop() ?? "").replace(/[\u0000-\u001f\u007f"]/g, "").trim().slice(0, 255) || fallback;

export async function addAttachment(ctx: ServiceContext, actor: Actor, testId: string, file: UploadedFile): Promise<StoredFile> {
  await loadTest(ctx.db, actor, testId);
  if (file.size === 0) throw new AppError(400, "invalid_attachment", "The attachment is empty.", [{ path: "file", message: "the file is empty" }]);
  const contentType = await sniff(file.path);
  if (!contentType) {
    const message = "attachments must be PNG, JPEG or WebP images or PDF documents; this file's first bytes match none of them";
    throw new AppError(415, "unsupported_type", `The attachment was not stored: ${message}.`, [{ path: "file", message }]);
  }
  const sha256 = await sha256Of(file.path);
  const id = newId();
  const key = `orgs/${actor.organizationId}/tests/${testId}/attachments/${id}`;
  const filename = safeFilename(file.originalName, `attachment-${id}`);
  await ctx.objects.put(key, createReadStream(file.path), { contentLength: file.size, contentType, sha256 });
  const now = ctx.clock();
  try {
    await ctx.db.transaction(async (tx) => {
      await loadTest(tx, actor, testId, true);
      await repo.insertTestFile(tx, actor.organizationId, { id, testId, kind: "attachment", filename, contentType, sizeBytes: file.size, sha256, objectKey: key, uploadedByUserId: actor.userId, uploadedAt: now });
      await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "test.attach", entityType: "boil_off_test", entityId: testId, detail: { attachmentId: id, filename, sha256 } }, now);
    });
  } catch (error) {
    await ctx.objects.delete([key]).catch(() => {});
    throw error;
  }
  const stored = (await repo.listTestFiles(ctx.db, actor.organizationId, testId, "attachment")).find((f) => f.file.id === id);
  return { id, filename, contentType, size_bytes: file.size, sha256, uploadedAt: now.toISOString(), uploadedBy: stored?.uploadedBy ?? null };
}

export async function getAttachment(ctx: ServiceContext, actor: Actor, testId: string, attachmentId: string): Promise<{ filename: string; contentType: string; size: number; sha256: string; body: Readable }> {
  await loadTest(ctx.db, actor, testId);
  const file = await repo.findTestFile(ctx.db, actor.organizationId, testId, attachmentId);
  if (!file || file.kind !== "attachment") throw notFound("attachment");
  return { filename: file.filename, contentType: file.contentType, size: file.sizeBytes, sha256: file.sha256, body: await ctx.objects.getStream(file.objectKey) };
}
