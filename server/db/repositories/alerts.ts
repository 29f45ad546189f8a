import { and, asc, desc, eq, inArray, isNotNull, isNull } from "drizzle-orm";
import { can, rolesThatCan } from "../../../shared/permissions";
import type { Tx } from "../client";
import { alerts, boilOffTests, designRevisions, designs, memberships, users } from "../schema";

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

/**
 * Who is told about an alert (shared/permissions.ts): members whose role receives every alert
 * mail (owners), and members whose role receives alert mail and who created the design or saved
 * one of its revisions (the design's engineers); each only while their own switch is on.
 */
export async function listAlertRecipients(db: Tx, organizationId: string, designId: string) {
  const authors = db
    .select({ userId: designRevisions.createdByUserId })
    .from(designRevisions)
    .where(and(eq(designRevisions.organizationId, organizationId), eq(designRevisions.designId, designId), isNotNull(designRevisions.createdByUserId)))
    .union(
      db
        .select({ userId: designs.createdByUserId })
        .from(designs)
        .where(and(eq(designs.organizationId, organizationId), eq(designs.id, designId), isNotNull(designs.createdByUserId))),
    );
  const authorIds = new Set((await authors).map((a) => a.userId));
  const members = await db
    .select({ userId: users.id, email: users.email, name: users.name, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.organizationId, organizationId), inArray(memberships.role, rolesThatCan("receive:alert-mail")), eq(users.alertEmails, true)))
    .orderBy(asc(users.email));
  return members.filter((m) => can(m.role, "receive:every-alert-mail") || authorIds.has(m.userId)).map(({ email, name, role }) => ({ email, name, role }));
}
