import { permissionsOf } from "../../shared/permissions";
import type { Me, PasswordResetConfirm, PreferencesInput, SignInInput, SignUpInput } from "../../shared/schemas/auth";
import * as accounts from "../db/repositories/accounts";
import { enqueueEmail } from "../db/repositories/outbox";
import { insertAuditEntry } from "../db/repositories/audit";
import { AppError, conflict, invalidToken, unauthenticated } from "../errors";
import { hashToken, newId, newLinkToken } from "../ids";
import { passwordResetMail } from "../mail/templates";
import type { ServiceContext } from "./context";
import { dummyPasswordHash, hashPassword, verifyPassword } from "./passwords";

const RESET_TTL_MS = 60 * 60 * 1000;

export async function loadMe(ctx: ServiceContext, userId: string): Promise<Me> {
  const account = await accounts.findAccountByUserId(ctx.db, userId);
  if (!account) throw unauthenticated();
  return {
    user: { id: account.user.id, name: account.user.name, email: account.user.email, unitSystem: account.user.unitSystem, alertEmails: account.user.alertEmails },
    organization: { id: account.organization.id, name: account.organization.name },
    role: account.membership.role,
    permissions: permissionsOf(account.membership.role),
    localMail: ctx.env.MAIL_MODE === "local",
  };
}

/** Creates the organization, its first user (the owner) and a session. */
export async function signUp(ctx: ServiceContext, input: SignUpInput): Promise<{ me: Me; sessionId: string }> {
  const passwordHash = await hashPassword(input.password);
  const now = ctx.clock();
  const userId = newId();
  const organizationId = newId();
  try {
    await ctx.db.transaction(async (tx) => {
      await accounts.insertOrganization(tx, { id: organizationId, name: input.organizationName, createdAt: now });
      await accounts.insertUser(tx, { id: userId, email: input.email, name: input.name, passwordHash, createdAt: now });
      await accounts.insertMembership(tx, { id: newId(), organizationId, userId, role: "owner", createdAt: now });
      await insertAuditEntry(tx, organizationId, { actorUserId: userId, action: "organization.create", entityType: "organization", entityId: organizationId }, now);
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw conflict("email_taken", "An account with this e-mail already exists. Sign in or reset the password.");
    throw error;
  }
  const session = await ctx.sessions.createSession(userId, {});
  return { me: await loadMe(ctx, userId), sessionId: session.id };
}

/** One message for a wrong e-mail and a wrong password, and the same work for both. */
export async function signIn(ctx: ServiceContext, input: SignInInput): Promise<{ me: Me; sessionId: string }> {
  const user = await accounts.findUserByEmail(ctx.db, input.email);
  const ok = await verifyPassword(user?.passwordHash ?? (await dummyPasswordHash()), input.password);
  if (!user || !ok) throw new AppError(401, "invalid_credentials", "The e-mail or the password is wrong.");
  const session = await ctx.sessions.createSession(user.id, {});
  return { me: await loadMe(ctx, user.id), sessionId: session.id };
}

export async function signOut(ctx: ServiceContext, sessionId: string): Promise<void> {
  await ctx.sessions.invalidateSession(sessionId);
  ctx.authCache.forgetSession(sessionId);
}

/** Always succeeds for the caller, so nobody can learn which addresses have accounts. */
export async function requestPasswordReset(ctx: ServiceContext, email: string): Promise<void> {
  const user = await accounts.findUserByEmail(ctx.db, email);
  if (!user) return;
  const account = await accounts.findAccountByUserId(ctx.db, user.id);
  const now = ctx.clock();
  const { token, tokenHash } = newLinkToken();
  const link = `${ctx.env.APP_ORIGIN}/reset-password/confirm?token=${token}`;
  const mail = passwordResetMail({ name: user.name, link });
  await ctx.db.transaction(async (tx) => {
    await accounts.insertPasswordResetToken(tx, { id: newId(), userId: user.id, tokenHash, expiresAt: new Date(now.getTime() + RESET_TTL_MS), createdAt: now });
    await enqueueEmail(tx, account?.organization.id ?? null, { id: newId(), toAddress: user.email, subject: mail.subject, textBody: mail.text, now });
  });
  ctx.outbox.kick();
}

/** Sets the new password, spends the token and ends every session of the user. */
export async function confirmPasswordReset(ctx: ServiceContext, input: PasswordResetConfirm): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  const now = ctx.clock();
  const userId = await ctx.db.transaction(async (tx) => {
    const token = await accounts.consumePasswordResetToken(tx, hashToken(input.token), now);
    if (!token) throw invalidToken();
    await accounts.updatePasswordHash(tx, token.userId, passwordHash);
    const account = await accounts.findAccountByUserId(tx, token.userId);
    if (account) {
      await insertAuditEntry(tx, account.organization.id, { actorUserId: token.userId, action: "user.password_reset", entityType: "user", entityId: token.userId }, now);
    }
    return token.userId;
  });
  await ctx.sessions.invalidateUserSessions(userId);
  ctx.authCache.forgetUser(userId);
}

export function isDuplicateKey(error: unknown): boolean {
  const code = (error as { code?: string; cause?: { code?: string } })?.code ?? (error as { cause?: { code?: string } })?.cause?.code;
  return code === "ER_DUP_ENTRY";
}

/** A person's own display preferences; the engine and the stored data stay SI. */
export async function updatePreferences(ctx: ServiceContext, userId: string, input: PreferencesInput): Promise<Me> {
  await accounts.updatePreferences(ctx.db, userId, input);
  return loadMe(ctx, userId);
}
