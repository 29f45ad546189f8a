import type { Server } from "node:http";
import { createApp } from "./app";
import { AuthCache } from "./cache/auth-cache";
import { EstimateMemo } from "./cache/estimate-memo";
import { LibraryCache } from "./cache/library-cache";
import { createDb } from "./db/client";
import { runMigrations } from "./db/migrate";
import { createSessionStore } from "./db/repositories/sessions";
import { cookieSecure, type Env } from "./env";
import { createLogger } from "./logger";
import { createOutboxSender } from "./mail/outbox-sender";
import { createMailTransport } from "./mail/transport";
import { createObjectStore } from "./storage/object-store";
import type { ServiceContext } from "./services/context";

/** Everything the app needs, built from the parsed env. Tests call this with their own env. */
export function buildContext(env: Env): { ctx: ServiceContext; close: () => Promise<void> } {
  const logger = createLogger(env.LOG_LEVEL);
  const { db, pool } = createDb(env.DATABASE_URL);
  const transport = createMailTransport(env);
  const libraryCache = new LibraryCache();
  const ctx: ServiceContext = {
    db,
    env,
    logger,
    sessions: createSessionStore(db, cookieSecure(env)),
    outbox: undefined as unknown as ServiceContext["outbox"],
    objects: createObjectStore(env),
    clock: () => new Date(),
    authCache: new AuthCache(),
    libraryCache,
    estimateMemo: new EstimateMemo(libraryCache),
  };
  // The sender reads the context's clock each time, so a test that moves the clock moves it too.
  const outbox = createOutboxSender({ db, transport, from: env.MAIL_FROM, logger, clock: () => ctx.clock() });
  ctx.outbox = outbox;
  return {
    ctx,
    async close() {
      await outbox.stop();
      transport.close();
      ctx.objects.close();
      await pool.end();
    },
  };
}

/** Migrates, then listens; close() stops taking requests, drains, and releases the pool. */
export async function startServer(env: Env): Promise<{ ctx: ServiceContext; server: Server; close: () => Promise<void> }> {
  const { ctx, close: closeContext } = buildContext(env);
  await runMigrations(ctx.db);
  await ctx.objects.check();
  const app = createApp(ctx);
  const server = await new Promise<Server>((resolve, reject) => {
    const s = app.listen(env.PORT, env.HOST, () => resolve(s));
    s.once("error", reject);
  });
  ctx.outbox.start();
  ctx.outbox.kick();
  return {
    ctx,
    server,
    async close() {
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeIdleConnections();
        setTimeout(() => server.closeAllConnections(), 5_000).unref();
      });
      await closeContext();
    },
  };
}
