import { and, asc, count, eq, gt, isNull } from "drizzle-orm";
import type { Role } from "../../../shared/permissions";
import type { Tx } from "../client";
import { invitations, memberships, organizations, users } from "../schema";

export async function listMembers(db: Tx, organizationId: string) {
  return db
    .select({ id: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.organizationId, organizationId))
    .orderBy(asc(users.name));
}

export async function findMember(db: Tx, organizationId: string, userId: string) {
  const [row] = await db
    .select({ id: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.organizationId, organizationId), eq(memberships.userId, userId)))
    .limit(1)
    .for("update");
  return row ?? null;
}

export async function countOwners(db: Tx, organizationId: string) {
  const [row] = await db
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.organizationId, organizationId), eq(memberships.role, "owner")));
  return row?.n ?? 0;
}

export async function setMemberRole(db: Tx, organizationId: string, userId: string, role: Role) {
  await db.update(memberships).set({ role }).where(and(eq(memberships.organizationId, organizationId), eq(memberships.userId, userId)));
}

export async function deleteMember(db: Tx, organizationId: string, userId: string) {
  await db.delete(memberships).where(and(eq(memberships.organizationId, organizationId), eq(memberships.userId, userId)));
}

export async function listPendingInvitations(db: Tx, organizationId: string, now: Date) {
  return db
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, invitedBy: users.name })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedByUserId))
    .where(
      and(eq(invitations.organizationId, organizationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, now)),
    )
    .orderBy(asc(invitations.createdAt));
}

export async function insertInvitation(
  db: Tx,
  organizationId: string,
  row: { id: string; email: string; role: Role; tokenHash: string; invitedByUserId: string; expiresAt: Date; createdAt: Date },
) {
  await db.insert(invitations).values({ ...row, organizationId });
}

export async function revokeInvitation(db: Tx, organizationId: string, invitationId: string, now: Date) {
  const [result] = await db
    .update(invitations)
    .set({ revokedAt: now })
    .where(and(eq(invitations.organizationId, organizationId), eq(invitations.id, invitationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
  return result.affectedRows > 0;
}

/** The token is the credential here, so the lookup cannot be scoped by organization first. */
export async function findUsableInvitationByTokenHash(db: Tx, tokenHash: string, now: Date) {
  const [row] = await db
    .select({ invitation: invitations, organizationName: organizations.name })
    .from(invitations)
    .innerJoin(organizations, eq(organizations.id, invitations.organizationId))
    .where(and(eq(invitations.tokenHash, tokenHash), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, now)))
    .limit(1);
  return row ?? null;
}

export async function markInvitationAccepted(db: Tx, organizationId: string, invitationId: string, now: Date) {
  const [result] = await db
    .update(invitations)
    .set({ acceptedAt: now })
    .where(and(eq(invitations.organizationId, organizationId), eq(invitations.id, invitationId), isNull(invitations.acceptedAt)));
  return result.affectedRows > 0;
}
