import { and, eq, isNull, gt } from "drizzle-orm";
import type { Role } from "../../../shared/permissions";
import type { Tx } from "../client";
import { memberships, organizations, passwordResetTokens, users } from "../schema";

// Accounts are looked up before anyone's organization is known (sign-in, reset), so these
// functions are the one place that reads users without an organization id.

export async function findUserByEmail(db: Tx, email: string) {
  const [row] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  return row ?? null;
}

export async function findAccountByUserId(db: Tx, userId: string) {
  const [row] = await db
    .select({ user: users, membership: memberships, organization: organizations })
    .from(users)
    .innerJoin(memberships, eq(memberships.userId, users.id))
    .innerJoin(organizations, eq(organizations.id, memberships.organizationId))
    .where(eq(users.id, userId))
    .limit(1);
  return row ?? null;
}

export async function insertOrganization(db: Tx, row: { id: string; name: string; createdAt: Date }) {
  await db.insert(organizations).values(row);
}

export async function insertUser(
  db: Tx,
  row: { id: string; email: string; name: string; passwordHash: string; createdAt: Date },
) {
  await db.insert(users).values(row);
}

export async function insertMembership(
  db: Tx,
  row: { id: string; organizationId: string; userId: string; role: Role; createdAt: Date },
) {
  await db.insert(memberships).values(row);
}

export async function updatePasswordHash(db: Tx, userId: string, passwordHash: string) {
  await db.update(users).set({ passwordHash }).where(eq(users.id, userId));
}

export async function insertPasswordResetToken(
  db: Tx,
  row: { id: string; userId: string; tokenHash: string; expiresAt: Date; createdAt: Date },
) {
  await db.insert(passwordResetTokens).values(row);
}

/** Marks an unused, unexpired token used and returns its user; null if none matched. */
export async function consumePasswordResetToken(db: Tx, tokenHash: string, now: Date) {
  const [row] = await db
    .select()
    .from(passwordResetTokens)
    .where(and(eq(passwordResetTokens.tokenHash, tokenHash), isNull(passwordResetTokens.usedAt), gt(passwordResetTokens.expiresAt, now)))
    .limit(1)
    .for("update");
  if (!row) return null;
  await db.update(passwordResetTokens).set({ usedAt: now }).where(eq(passwordResetTokens.id, row.id));
  return row;
}

export async function updatePreferences(db: Tx, userId: string, preferences: { unitSystem?: "si" | "us"; alertEmails?: boolean }) {
  await db.update(users).set(preferences).where(eq(users.id, userId));
}
