import { Router } from "express";
import { notFound } from "../errors";
import type { ServiceContext } from "../services/context";
import { alertsRouter } from "./alerts";
import { authRouter } from "./auth";
import { boilOffTestsRouter } from "./boil-off-tests";
import { calibrationRouter } from "./calibration";
import { cryogensRouter } from "./cryogens";
import { compareRouter, designsRouter } from "./designs";
import { healthRouter } from "./health";
import { materialsRouter } from "./materials";
import { outboxRouter } from "./outbox";
import { settingsRouter } from "./settings";
import { invitationsRouter, teamRouter } from "./team";

/** Every router under /api but the live preview's estimate, which app.ts mounts first. */
export function apiRouter(ctx: ServiceContext): Router {
  const api = Router();
  api.use(compareRouter(ctx));
  api.use("/health", healthRouter(ctx));
  api.use("/auth", authRouter(ctx));
  api.use("/team", teamRouter(ctx));
  api.use("/invitations", invitationsRouter(ctx));
  api.use("/outbox", outboxRouter(ctx));
  api.use("/materials", materialsRouter(ctx));
  api.use("/cryogens", cryogensRouter(ctx));
  api.use("/designs", designsRouter(ctx));
  api.use("/designs", calibrationRouter(ctx));
  api.use("/boil-off-tests", boilOffTestsRouter(ctx));
  api.use("/alerts", alertsRouter(ctx));
  api.use("/settings", settingsRouter(ctx));
  api.use(() => {
    throw notFound("API route");
  });
  return api;
}
