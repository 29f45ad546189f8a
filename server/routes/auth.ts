import { Router } from "express";
import { PasswordResetConfirmSchema, PasswordResetRequestSchema, PreferencesInputSchema, SignInInputSchema, SignUpInputSchema } from "../../shared/schemas/auth";
import { clearSessionCookie, requireSession, setSessionCookie } from "../middleware/session";
import { actorOf } from "../middleware/require-permission";
import { parseInput } from "../middleware/validate";
import { publicFormRateLimit, signInRateLimits } from "../middleware/rate-limit";
import * as auth from "../services/auth";
import type { ServiceContext } from "../services/context";

export function authRouter(ctx: ServiceContext): Router {
  const router = Router();
  const publicLimit = publicFormRateLimit(ctx.env);

  router.post("/sign-up", publicLimit, async (req, res) => {
    const { me, sessionId } = await auth.signUp(ctx, parseInput(SignUpInputSchema, req.body));
    setSessionCookie(ctx, res, sessionId);
    res.status(201).json(me);
  });

  router.post("/sign-in", ...signInRateLimits(ctx.env), async (req, res) => {
    const { me, sessionId } = await auth.signIn(ctx, parseInput(SignInInputSchema, req.body));
    setSessionCookie(ctx, res, sessionId);
    res.json(me);
  });

  router.post("/sign-out", requireSession, async (req, res) => {
    await auth.signOut(ctx, actorOf(req).sessionId);
    clearSessionCookie(ctx, res);
    res.status(204).end();
  });

  router.get("/me", requireSession, async (req, res) => {
    res.json(await auth.loadMe(ctx, actorOf(req).userId));
  });

  router.patch("/me/preferences", requireSession, async (req, res) => {
    res.json(await auth.updatePreferences(ctx, actorOf(req).userId, parseInput(PreferencesInputSchema, req.body)));
  });

  router.post("/password-reset", publicLimit, async (req, res) => {
    await auth.requestPasswordReset(ctx, parseInput(PasswordResetRequestSchema, req.body).email);
    res.status(202).json({ ok: true });
  });

  router.post("/password-reset/confirm", publicLimit, async (req, res) => {
    await auth.confirmPasswordReset(ctx, parseInput(PasswordResetConfirmSchema, req.body));
    clearSessionCookie(ctx, res);
    res.json({ ok: true });
  });

  return router;
}
