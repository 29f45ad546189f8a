import type { Role } from "../../shared/permissions";
import type { AcceptInvitationInput, Invitation, InvitationPreview, InviteInput, Member, Team } from "../../shared/schemas/team";
import * as accounts from "../db/repositories/accounts";
import { insertAuditEntry } from "../db/repositories/audit";
import { enqueueEmail } from "../db/repositories/outbox";
import * as team from "../db/repositories/team";
import { conflict, invalidToken, notFound } from "../errors";
import { hashToken, newId, newLinkToken } from "../ids";
import { invitationMail } from "../mail/templates";
import { isDuplicateKey } from "./auth";
import type { Actor, ServiceContext } from "./context";
import { hashPassword } from "./passwords";

const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

const toMember = (m: { id: string; name: string; email: string; role: Role; joinedAt: Date }): Member => ({
  ...m,
  joinedAt: m.joinedAt.toISOString(),
});

export async function listTeam(ctx: ServiceContext, actor: Actor): Promise<Team> {
  const [members, invitations] = await Promise.all([
    team.listMembers(ctx.db, actor.organizationId),
    team.listPendingInvitations(ctx.db, actor.organizationId, ctx.clock()),
  ]);
  return {
    members: members.map(toMember),
    invitations: invitations.map((i) => ({ ...i, expiresAt: i.expiresAt.toISOString(), invitedBy: i.invitedBy ?? "a former member" })),
  };
}

const lastOwner = () => conflict("last_owner", "The organization needs at least one owner: make someone else owner first.");

export async function changeMemberRole(ctx: ServiceContext, actor: Actor, userId: string, role: Role): Promise<Member> {
  const now = ctx.clock();
  const updated = await ctx.db.transaction(async (tx) => {
    const member = await team.findMember(tx, actor.organizationId, userId);
    if (!member) throw notFound("member");
    if (member.role === "owner" && role !== "owner" && (await team.countOwners(tx, actor.organizationId)) <= 1) throw lastOwner();
    await team.setMemberRole(tx, actor.organizationId, userId, role);
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "member.role_change", entityType: "user", entityId: userId, detail: { from: member.role, to: role } }, now);
    return { ...member, role };
  });
  // A demoted member keeps no session that carries the old role's reach beyond the next request.
  ctx.authCache.forgetUser(userId);
  return toMember(updated);
}

export async function removeMember(ctx: ServiceContext, actor: Actor, userId: string): Promise<void> {
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    const member = await team.findMember(tx, actor.organizationId, userId);
    if (!member) throw notFound("member");
    if (member.role === "owner" && (await team.countOwners(tx, actor.organizationId)) <= 1) throw lastOwner();
    await team.deleteMember(tx, actor.organizationId, userId);
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "member.remove", entityType: "user", entityId: userId, detail: { email: member.email } }, now);
  });
  await ctx.sessions.invalidateUserSessions(userId);
  ctx.authCache.forgetUser(userId);
}

export async function inviteMember(ctx: ServiceContext, actor: Actor, input: InviteInput): Promise<Invitation> {
  if (await accounts.findUserByEmail(ctx.db, input.email)) {
    throw conflict("already_member", "This e-mail already has a Frostfold account; one account belongs to one organization.");
  }
  const inviter = await accounts.findAccountByUserId(ctx.db, actor.userId);
  const now = ctx.clock();
  const expiresAt = new Date(now.getTime() + INVITATION_TTL_MS);
  const { token, tokenHash } = newLinkToken();
  const id = newId();
  const mail = invitationMail({
    organizationName: inviter?.organization.name ?? "your team",
    inviterName: inviter?.user.name ?? "A colleague",
    role: input.role,
    link: `${ctx.env.APP_ORIGIN}/invitations/accept?token=${token}`,
  });
  await ctx.db.transaction(async (tx) => {
    await team.insertInvitation(tx, actor.organizationId, { id, email: input.email, role: input.role, tokenHash, invitedByUserId: actor.userId, expiresAt, createdAt: now });
    await enqueueEmail(tx, actor.organizationId, { id: newId(), toAddress: input.email, subject: mail.subject, textBody: mail.text, now });
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "invitation.create", entityType: "invitation", entityId: id, detail: { email: input.email, role: input.role } }, now);
  });
  ctx.outbox.kick();
  return { id, email: input.email, role: input.role, expiresAt: expiresAt.toISOString(), invitedBy: inviter?.user.name ?? "" };
}

export async function revokeInvitation(ctx: ServiceContext, actor: Actor, invitationId: string): Promise<void> {
  const now = ctx.clock();
  await ctx.db.transaction(async (tx) => {
    if (!(await team.revokeInvitation(tx, actor.organizationId, invitationId, now))) throw notFound("invitation");
    await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "invitation.revoke", entityType: "invitation", entityId: invitationId }, now);
  });
}

export async function previewInvitation(ctx: ServiceContext, token: string): Promise<InvitationPreview> {
  const found = await team.findUsableInvitationByTokenHash(ctx.db, hashToken(token), ctx.clock());
  if (!found) throw invalidToken();
  return { email: found.invitation.email, role: found.invitation.role, organizationName: found.organizationName };
}

/** Creates the invitee's account in the inviting organization and signs them in. */
export async function acceptInvitation(ctx: ServiceContext, input: AcceptInvitationInput): Promise<{ userId: string; sessionId: string }> {
  const passwordHash = await hashPassword(input.password);
  const now = ctx.clock();
  const userId = newId();
  try {
    await ctx.db.transaction(async (tx) => {
      const found = await team.findUsableInvitationByTokenHash(tx, hashToken(input.token), now);
      if (!found) throw invalidToken();
      const { invitation } = found;
      // The conditional update makes a second, racing accept fail instead of adding twice.
      if (!(await team.markInvitationAccepted(tx, invitation.organizationId, invitation.id, now))) throw invalidToken();
      await accounts.insertUser(tx, { id: userId, email: invitation.email, name: input.name, passwordHash, createdAt: now });
      await accounts.insertMembership(tx, { id: newId(), organizationId: invitation.organizationId, userId, role: invitation.role, createdAt: now });
      await insertAuditEntry(tx, invitation.organizationId, { actorUserId: userId, action: "invitation.accept", entityType: "invitation", entityId: invitation.id, detail: { role: invitation.role } }, now);
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw conflict("already_member", "This e-mail already has a Frostfold account. Sign in instead.");
    throw error;
  }
  const session = await ctx.sessions.createSession(userId, {});
  return { userId, sessionId: session.id };
}
