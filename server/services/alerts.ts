import type { Alert } from "../../shared/schemas/alert";
import type { Analysis } from "../../shared/schemas/boil-off-test";
import * as repo from "../db/repositories/alerts";
import { insertAuditEntry } from "../db/repositories/audit";
import type { TestRow } from "../db/repositories/boil-off-tests";
import { enqueueEmail } from "../db/repositories/outbox";
import { findAlertThreshold } from "../db/repositories/settings";
import type { Tx } from "../db/client";
import { conflict, notFound } from "../errors";
import { newId } from "../ids";
import type { Actor, ServiceContext } from "./context";

const fmt = (x: number, digits = 3) => x.toPrecision(digits);

function alertText(p: { designName: string; test: TestRow; analysis: Analysis; threshold: number; link: string }) {
  const a = p.analysis;
  const message =
    `${p.test.vesselLabel} (${p.designName}, revision ${p.test.revision}, ${a.stageLabel}): measured heat leak ` +
    `${fmt(a.measuredHeatLeak_W)} W is ${a.ratio!.toFixed(2)}× the prediction of ${fmt(a.predictedHeatLeak_W!)} W, ` +
    `above the alert threshold of ${p.threshold.toFixed(2)}×.`;
  return {
    message: message.slice(0, 500),
    subject: `Boil-off test over its prediction: ${p.test.vesselLabel} at ${a.ratio!.toFixed(2)}×`.slice(0, 200),
    text:
      `${message}\n\n` +
      `The ratio's 95 % interval is ${a.ratioInterval95!.map((r) => r.toFixed(2)).join(" to ")}. A vessel well over its ` +
      "prediction may have a degraded vacuum, a damaged blanket or a thermal short.\n\n" +
      `Open the test:\n${p.link}\n\n-- \nFrostfold. You receive this as an owner of the organization or an engineer of the design.`,
  };
}

/**
 * Inside the accepting transaction: when the accepted ratio exceeds the organization's
 * threshold, an open alert and one e-mail per owner and per engineer of the design go in with it. Returns whether
 * mail was queued, so the caller kicks the outbox after commit.
 */
export async function raiseAlertIfOver(
  ctx: ServiceContext,
  tx: Tx,
  actor: Actor,
  p: { test: TestRow; designName: string; analysis: Analysis },
  now: Date,
): Promise<boolean> {
  const { ratio, ratioInterval95, predictedHeatLeak_W } = p.analysis;
  const threshold = await findAlertThreshold(tx, actor.organizationId);
  if (ratio === null || ratioInterval95 === null || predictedHeatLeak_W === null || threshold === null || !(ratio > threshold)) return false;
  const id = newId();
  const mail = alertText({ ...p, threshold, link: `${ctx.env.APP_ORIGIN}/tests/${p.test.id}` });
  await repo.insertAlert(tx, actor.organizationId, {
    id,
    testId: p.test.id,
    ratio,
    threshold,
    measuredHeatLeak_W: p.analysis.measuredHeatLeak_W,
    predictedHeatLeak_W,
    message: mail.message,
    createdAt: now,
  });
  const recipients = await repo.listAlertRecipients(tx, actor.organizationId, p.test.designId);
  for (const r of recipients) {
    await enqueueEmail(tx, actor.organizationId, { id: newId(), toAddress: r.email, subject: mail.subject, textBody: mail.text, now });
  }
  await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "alert.raise", entityType: "alert", entityId: id, detail: { testId: p.test.id, ratio, threshold, recipients: recipients.length } }, now);
  return recipients.length > 0;
}

const alertOf = (r: NonNullable<Awaited<ReturnType<typeof repo.findAlert>>>): Alert => ({
  id: r.alert.id,
  testId: r.alert.testId,
  designId: r.designId,
  designName: r.designName,
  revision: r.revision,
  vesselLabel: r.vesselLabel,
  ratio: r.alert.ratio,
  threshold: r.alert.threshold,
  measuredHeatLeak_W: r.alert.measuredHeatLeak_W,
  predictedHeatLeak_W: r.alert.predictedHeatLeak_W,
  message: r.alert.message,
  createdAt: r.alert.createdAt.toISOString(),
  acknowledgedAt: r.alert.acknowledgedAt ? r.alert.acknowledgedAt.toISOString() : null,
  acknowledgedBy: r.acknowledgedBy,
});

export async function listOpenAlerts(ctx: ServiceContext, actor: Actor): Promise<Alert[]> {
  return (await repo.listOpenAlerts(ctx.db, actor.organizationId)).map(alertOf);
}

export async function acknowledgeAlert(ctx: ServiceContext, actor: Actor, id: string): Promise<Alert> {
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    const found = await repo.findAlert(tx, actor.organizationId, id);
    if (!found) throw notFound("alert");
    if (!(await repo.acknowledgeAlert(tx, actor.organizationId, id, actor.userId, now))) {
      throw conflict("already_acknowledged", `This alert was already acknowledged${found.acknowledgedBy ? ` by ${found.acknowledgedBy}` : ""}.`);
    }
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "alert.acknowledge", entityType: "alert", entityId: id, detail: { testId: found.alert.testId } }, now);
  });
  const row = await repo.findAlert(ctx.db, actor.organizationId, id);
  return alertOf(row!);
}
