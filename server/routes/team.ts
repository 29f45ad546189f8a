import { Router } from "express";
import { z } from "zod";
import { TokenSchema } from "../../shared/schemas/auth";
import { AcceptInvitationInputSchema, ChangeRoleInputSchema, InviteInputSchema, MemberParamsSchema } from "../../shared/schemas/team";
import { actorOf, requirePermission } from "../middleware/require-permission";
import { publicFormRateLimit } from "../middleware/rate-limit";
import { setSessionCookie } from "../middleware/session";
import { parseInput } from "../middleware/validate";
import { loadMe } from "../services/auth";
import type { ServiceContext } from "../services/context";
import * as team from "../services/team";

export function teamRouter(ctx: ServiceContext): Router {
  const router = Router();

  router.get("/members", requirePermission("read:team"), async (req, res) => {
    res.json(await team.listTeam(ctx, actorOf(req)));
  });

  router.patch("/members/:id", requirePermission("manage:team"), async (req, res) => {
    const { id } = parseInput(MemberParamsSchema, req.params, "path");
    const { role } = parseInput(ChangeRoleInputSchema, req.body);
    res.json(await team.changeMemberRole(ctx, actorOf(req), id, role));
  });

  router.delete("/members/:id", requirePermission("manage:team"), async (req, res) => {
    const { id } = parseInput(MemberParamsSchema, req.params, "path");
    await team.removeMember(ctx, actorOf(req), id);
    res.status(204).end();
  });

  router.post("/invitations", requirePermission("manage:team"), async (req, res) => {
    res.status(201).json(await team.inviteMember(ctx, actorOf(req), parseInput(InviteInputSchema, req.body)));
  });

  router.delete("/invitations/:id", requirePermission("manage:team"), async (req, res) => {
    const { id } = parseInput(MemberParamsSchema, req.params, "path");
    await team.revokeInvitation(ctx, actorOf(req), id);
    res.status(204).end();
  });

  return router;
}

/** Reached from the e-mail link, before the invitee has an account. */
export function invitationsRouter(ctx: ServiceContext): Router {
  const router = Router();
  const limit = publicFormRateLimit(ctx.env);

  router.get("/:token", limit, async (req, res) => {
    const { token } = parseInput(z.object({ token: TokenSchema }), req.params, "path");
    res.json(await team.previewInvitation(ctx, token));
  });

  router.post("/accept", limit, async (req, res) => {
    const { userId, sessionId } = await team.acceptInvitation(ctx, parseInput(AcceptInvitationInputSchema, req.body));
    setSessionCookie(ctx, res, sessionId);
    res.json(await loadMe(ctx, userId));
  });

  return router;
}
