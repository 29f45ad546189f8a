import { rateLimit } from "express-rate-limit";
import type { RequestHandler } from "express";
import type { Env } from "../env";
import { tooManyRequests } from "../errors";

const limited = (minutes: number) =>
  tooManyRequests(`Too many sign-in attempts. Wait ${minutes} minutes, or reset your password.`);

/** Sign-in limits: one bucket per client address and one per e-mail address tried. */
export function signInRateLimits(env: Env): RequestHandler[] {
  const windowMs = env.SIGN_IN_WINDOW_MINUTES * 60_000;
  const handler: RequestHandler = () => {
    throw limited(env.SIGN_IN_WINDOW_MINUTES);
  };
  const perAddress = rateLimit({ windowMs, limit: env.SIGN_IN_LIMIT_PER_IP, standardHeaders: "draft-8", legacyHeaders: false, handler });
  const perEmail = rateLimit({
    windowMs,
    limit: env.SIGN_IN_LIMIT_PER_EMAIL,
    standardHeaders: false,
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    keyGenerator: (req) => `email:${String((req.body as { email?: unknown } | undefined)?.email ?? "").trim().toLowerCase()}`,
    handler,
  });
  return [perAddress, perEmail];
}

/** A looser limit for the other unauthenticated mail-sending and account-creating routes. */
export function publicFormRateLimit(env: Env): RequestHandler {
  return rateLimit({
    windowMs: env.SIGN_IN_WINDOW_MINUTES * 60_000,
    limit: env.SIGN_IN_LIMIT_PER_IP * 2,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    handler: () => {
      throw tooManyRequests("Too many requests from this address. Try again later.");
    },
  });
}
