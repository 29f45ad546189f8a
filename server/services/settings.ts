import type { AlertSettings } from "../../shared/schemas/alert";
import { insertAuditEntry } from "../db/repositories/audit";
import * as repo from "../db/repositories/settings";
import { notFound } from "../errors";
import type { Actor, ServiceContext } from "./context";

export async function getAlertSettings(ctx: ServiceContext, actor: Actor): Promise<AlertSettings> {
  const threshold = await repo.findAlertThreshold(ctx.db, actor.organizationId);
  if (threshold === null) throw notFound("organization");
  return { threshold };
}

/** A new threshold applies to tests accepted from now on; alerts already raised stay as they are. */
export async function setAlertSettings(ctx: ServiceContext, actor: Actor, input: AlertSettings): Promise<AlertSettings> {
  const now = ctx.clock();
  // The column keeps three decimals; store and report the same number.
  const threshold = Math.round(input.threshold * 1000) / 1000;
  await ctx.db.transaction(async (tx) => {
    const before = await repo.findAlertThreshold(tx, actor.organizationId);
    if (before === null) throw notFound("organization");
    await repo.updateAlertThreshold(tx, actor.organizationId, threshold);
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "settings.alert_threshold", entityType: "organization", entityId: actor.organizationId, detail: { from: before, to: threshold } }, now);
  });
  return { threshold };
}
