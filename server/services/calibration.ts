import type { Calibration } from "../../shared/schemas/boil-off-test";
import type { RevisionDetail } from "../../shared/schemas/design";
import { insertAuditEntry } from "../db/repositories/audit";
import { listAcceptedTestsOfDesign } from "../db/repositories/boil-off-tests";
import { findDesign, findRevision } from "../db/repositories/designs";
import { conflict, notFound } from "../errors";
import type { Actor, ServiceContext } from "./context";
import { saveRevision } from "./designs";

/**
 * What the accepted tests say about a design's degradation factor. Each test gives a ratio
 * measured/predicted with a standard error from its fit; they are pooled as the inverse-variance
 * weighted mean, x̄ = Σ(xᵢ/σᵢ²)/Σ(1/σᵢ²) with standard error 1/√Σ(1/σᵢ²) (e.g. Taylor, An
 * Introduction to Error Analysis, 2nd ed., §7.2, from memory). That error reflects the fits only:
 * real tests scatter more than their fits say, so treat it as a lower bound.
 */
const METHOD =
  "Inverse-variance weighted mean of the accepted tests' measured/predicted heat-leak ratios; its standard error is " +
  "1/√Σ(1/σ²) from each fit's own error, so it understates the spread between tests. Each ratio is against the " +
  "revision that test ran on; applying it multiplies every block's degradation factor, not the supports' heat.";

// A perfect synthetic fit has σ = 0; this floor keeps its weight finite (our choice).
const MIN_RELATIVE_ERROR = 1e-6;
const DEGRADATION_RANGE = { min: 1, max: 10 } as const; // the design schema's bounds

export async function getCalibration(ctx: ServiceContext, actor: Actor, designId: string): Promise<Calibration> {
  const design = await findDesign(ctx.db, actor.organizationId, designId);
  if (!design) throw notFound("design");
  const rows = await listAcceptedTestsOfDesign(ctx.db, actor.organizationId, designId);
  const tests = rows
    .filter((t) => t.analysis?.ratio != null && t.analysis.ratioStdError != null && t.acceptedAt)
    .map((t) => ({
      id: t.id,
      revision: t.revision,
      stageLabel: t.stageLabel,
      vesselLabel: t.vesselLabel,
      ratio: t.analysis!.ratio!,
      ratioStdError: t.analysis!.ratioStdError!,
      acceptedAt: t.acceptedAt!.toISOString(),
    }));
  let factor: number | null = null;
  let factorStdError: number | null = null;
  if (tests.length > 0) {
    let sumW = 0;
    let sumWx = 0;
    for (const t of tests) {
      const sigma = Math.max(t.ratioStdError, MIN_RELATIVE_ERROR * Math.abs(t.ratio), Number.MIN_VALUE);
      const w = 1 / (sigma * sigma);
      sumW += w;
      sumWx += w * t.ratio;
    }
    factor = sumWx / sumW;
    factorStdError = 1 / Math.sqrt(sumW);
  }
  return { designId, latestRevision: design.latestRevision, tests, factor, factorStdError, method: METHOD };
}

const clamp = (x: number) => Math.min(DEGRADATION_RANGE.max, Math.max(DEGRADATION_RANGE.min, x));

/** Saves a new revision through saveRevision, so a stale base is the usual 409 and nothing is written. */
export async function applyCalibration(
  ctx: ServiceContext,
  actor: Actor,
  designId: string,
  baseRevision: number,
): Promise<RevisionDetail & { calibration: { factor: number; factorStdError: number; tests: number; clampedBlocks: number[] } }> {
  const calibration = await getCalibration(ctx, actor, designId);
  if (calibration.factor === null || calibration.factorStdError === null) {
    throw conflict("no_accepted_tests", "This design has no accepted boil-off test with a ratio to its prediction, so there is nothing to calibrate from.");
  }
  const base = await findRevision(ctx.db, actor.organizationId, designId, baseRevision);
  if (!base) throw notFound("design revision");
  const factor = calibration.factor;
  const clampedBlocks: number[] = [];
  const content = structuredClone(base.revision.content);
  content.layup.forEach((item, i) => {
    if (item.kind !== "block") return;
    const wanted = item.degradationFactor * factor;
    const kept = Math.round(clamp(wanted) * 1000) / 1000;
    if (Math.abs(kept - wanted) > 5e-4) clampedBlocks.push(i);
    item.degradationFactor = kept;
  });
  const n = calibration.tests.length;
  const revision = await saveRevision(ctx, actor, designId, { baseRevision, content, changeNote: `Calibrated from ${n} accepted test${n === 1 ? "" : "s"}` });
  await insertAuditEntry(ctx.db, actor.organizationId, { actorUserId: actor.userId, action: "design.calibrate", entityType: "design", entityId: designId, detail: { revision: revision.revision, factor, tests: calibration.tests.map((t) => t.id), clampedBlocks } }, ctx.clock());
  return { ...revision, calibration: { factor, factorStdError: calibration.factorStdError, tests: n, clampedBlocks } };
}
