import type { RequestHandler, Response } from "express";
import { findAccountByUserId } from "../db/repositories/accounts";
import { unauthenticated } from "../errors";
import type { ServiceContext } from "../services/context";

/**
 * Reads the session cookie; the role comes from the database (or the auth cache, which every
 * change of role or session clears at once), never from the cookie.
 */
export function sessionMiddleware(ctx: ServiceContext): RequestHandler {
  return async (req, res, next) => {
    const sessionId = ctx.sessions.readSessionCookie(req.headers.cookie ?? "");
    if (!sessionId) return next();
    const known = ctx.authCache.get(sessionId);
    if (known) {
      req.auth = known;
      return next();
    }
    const ticket = ctx.authCache.ticket();
    const { session, user } = await ctx.sessions.validateSession(sessionId);
    if (!session) {
      res.append("Set-Cookie", ctx.sessions.createBlankSessionCookie().serialize());
      return next();
    }
    if (session.fresh) res.append("Set-Cookie", ctx.sessions.createSessionCookie(session.id).serialize());
    const account = await findAccountByUserId(ctx.db, user.id);
    if (account) {
      req.auth = { userId: user.id, organizationId: account.organization.id, role: account.membership.role, sessionId: session.id };
      ctx.authCache.remember(req.auth, session.expiresAt, ticket);
    }
    next();
  };
}

export function setSessionCookie(ctx: ServiceContext, res: Response, sessionId: string) {
  res.append("Set-Cookie", ctx.sessions.createSessionCookie(sessionId).serialize());
}

export function clearSessionCookie(ctx: ServiceContext, res: Response) {
  res.append("Set-Cookie", ctx.sessions.createBlankSessionCookie().serialize());
}

export const requireSession: RequestHandler = (req, _res, next) => {
  if (!req.auth) throw unauthenticated();
  next();
};
