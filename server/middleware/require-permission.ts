import type { Request, RequestHandler } from "express";
import { can, type Action } from "../../shared/permissions";
import { forbidden, unauthenticated } from "../errors";
import type { Actor } from "../services/context";

/** 401 without a session, 403 when shared/permissions does not grant the action to the role. */
export function requirePermission(action: Action): RequestHandler {
  return (req, _res, next) => {
    if (!req.auth) throw unauthenticated();
    if (!can(req.auth.role, action)) throw forbidden(`Your role (${req.auth.role}) does not allow ${action.replace(":", " ")}.`);
    next();
  };
}

/** The actor of a route behind requirePermission or requireSession. */
export function actorOf(req: Request): Actor {
  if (!req.auth) throw unauthenticated();
  return req.auth;
}
