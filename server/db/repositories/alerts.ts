import { and, desc, eq, inArray, isNull } from "drizzle-orm";
import type { Tx } from "../client";
import { alerts, boilOffTests, designs, memberships, users } from "../schema";

type NewAlert = Omit<typeof alerts.$inferInsert, "organizationId">;

export async function insertAlert(db: Tx, organizationId: string, row: NewAlert) {
  await db.insert(alerts).values({ ...row, organizationId });
}

const alertColumns = {
  alert: alerts,
  designId: boilOffTests.designId,
  designName: designs.name,
  revision: boilOffTests.revision,
  vesselLabel: boilOffTests.vesselLabel,
  acknowledgedBy: users.name,
};

/** Open alerts, newest first: what Overview shows. */
export async function listOpenAlerts(db: Tx, organizationId: string) {
  return db
    .select(alertColumns)
    .from(alerts)
    .innerJoin(boilOffTests, eq(boilOffTests.id, alerts.testId))
    .innerJoin(designs, eq(designs.id, boilOffTests.designId))
    .leftJoin(users, eq(users.id, alerts.acknowledgedByUserId))
    .where(and(eq(alerts.organizationId, organizationId), isNull(alerts.acknowledgedAt)))
    .orderBy(desc(alerts.createdAt))
    .limit(200);
}

export async function findAlert(db: Tx, organizationId: string, id: string) {
  const [row] = await db
    .select(alertColumns)
    .from(alerts)
    .innerJoin(boilOffTests, eq(boilOffTests.id, alerts.testId))
    .innerJoin(designs, eq(designs.id, boilOffTests.designId))
    .leftJoin(users, eq(users.id, alerts.acknowledgedByUserId))
    .where(and(eq(alerts.organizationId, organizationId), eq(alerts.id, id)))
    .limit(1);
  return row ?? null;
}

/** Conditional, so two people acknowledging at once record only the first. */
export async function acknowledgeAlert(db: Tx, organizationId: string, id: string, userId: string, now: Date) {
  const [result] = await db
    .update(alerts)
    .set({ acknowledgedAt: now, acknowledgedByUserId: userId })
    .where(and(eq(alerts.organizationId, organizationId), eq(alerts.id, id), isNull(alerts.acknowledgedAt)));
  return result.affectedRows > 0;
}

/** Who is told about an alert: the organization's owners and engineers. */
export async function listAlertRecipients(db: Tx, organizationId: string) {
  return db
    .select({ email: users.email, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.organizationId, organizationId), inArray(memberships.role, ["owner", "engineer"])));
}
