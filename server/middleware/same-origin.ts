import type { RequestHandler } from "express";
import { AppError } from "../errors";

const SAFE = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Refuses state-changing requests whose Origin (or, failing that, Referer) is not ours:
 * with cookie sessions this is the defence against cross-site request forgery.
 */
export function sameOrigin(allowedOrigins: string[]): RequestHandler {
  const allowed = new Set(allowedOrigins.map((o) => new URL(o).origin));
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.get("origin") ?? originOf(req.get("referer"));
    if (!origin || !allowed.has(origin)) {
      throw new AppError(403, "bad_origin", "This request did not come from a Frostfold page, so it was refused.");
    }
    next();
  };
}

function originOf(referer: string | undefined): string | undefined {
  if (!referer) return undefined;
  try {
    return new URL(referer).origin;
  } catch {
    return undefined;
  }
}
