import express from "express";
import helmet from "helmet";
import { existsSync } from "node:fs";
import path from "node:path";
import { errorHandler } from "./middleware/error-handler";
import { requestLog } from "./middleware/request-log";
import { sameOrigin } from "./middleware/same-origin";
import { sessionMiddleware } from "./middleware/session";
import { apiRouter } from "./routes";
import { estimateRouter } from "./routes/designs";
import type { ServiceContext } from "./services/context";

/**
 * Builds the Express app without listening, so tests start it in-process on port 0.
 * Middleware order matters: ids and logs first, then security headers, the origin check,
 * the body, the session, the API, the built client, and the one error handler last.
 */
export function createApp(ctx: ServiceContext) {
  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", "loopback");

  app.use(requestLog(ctx.logger, { ignore: (url) => url === "/api/health" }));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: { "img-src": ["'self'", "data:", "blob:"], "upgrade-insecure-requests": null },
      },
      strictTransportSecurity: !ctx.env.APP_ORIGIN.startsWith("http://"),
    }),
  );
  app.use("/api", sameOrigin([ctx.env.APP_ORIGIN]));
  // The live preview takes most requests by far; it reads its own body and session (routes/designs.ts).
  app.use("/api", estimateRouter(ctx));
  app.use("/api", express.json({ limit: "1mb" }));
  app.use("/api", sessionMiddleware(ctx));
  app.use("/api", apiRouter(ctx));

  const clientDir = path.resolve(ctx.env.CLIENT_DIST);
  if (existsSync(path.join(clientDir, "index.html"))) {
    app.use(express.static(clientDir, { index: false, maxAge: "1h" }));
    // Client-side routes: every other GET gets the app shell.
    app.get(/^(?!\/api\/).*/, (_req, res) => {
      res.setHeader("Cache-Control", "no-cache");
      res.sendFile(path.join(clientDir, "index.html"));
    });
  }

  app.use(errorHandler);
  return app;
}
