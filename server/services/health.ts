import { pingDatabase } from "../db/repositories/health";
import type { ServiceContext } from "./context";

export async function checkHealth(ctx: ServiceContext) {
  const started = performance.now();
  try {
    await pingDatabase(ctx.db);
    return { status: "ok" as const, database: { status: "ok" as const, latency_ms: Math.round((performance.now() - started) * 10) / 10 } };
  } catch {
    return { status: "degraded" as const, database: { status: "unreachable" as const } };
  }
}
