import express from "express";
import { pino } from "pino";
import supertest from "supertest";
import { describe, expect, it } from "vitest";
import { requestLog } from "./request-log";

/** An app whose logger writes JSON lines into an array instead of stdout. */
function appLoggingAt(level: string) {
  const lines: Record<string, unknown>[] = [];
  const logger = pino({ level }, { write: (line: string) => lines.push(JSON.parse(line)) });
  const app = express();
  app.use(requestLog(logger, { ignore: (url) => url === "/api/health" }));
  app.get("/api/health", (_req, res) => res.json({ ok: true }));
  app.get("/api/thing", (req, res) => res.status(418).json({ id: req.id }));
  return { app, lines };
}

describe("the request log", () => {
  it("gives each request its own id, sent back as X-Request-Id", async () => {
    const { app } = appLoggingAt("silent");
    const [a, b] = [await supertest(app).get("/api/thing"), await supertest(app).get("/api/thing")];
    expect(a.headers["x-request-id"]).toMatch(/^[0-9a-f-]{36}$/);
    expect(a.body.id).toBe(a.headers["x-request-id"]);
    expect(b.headers["x-request-id"]).not.toBe(a.headers["x-request-id"]);
  });

  it("logs one line per finished request at info, without its cookie, and skips the health probe", async () => {
    const { app, lines } = appLoggingAt("info");
    const res = await supertest(app).get("/api/thing?x=1").set("Cookie", "frostfold_session=secret");
    await supertest(app).get("/api/health");
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({ msg: "request completed", method: "GET", url: "/api/thing?x=1", status: 418, reqId: res.headers["x-request-id"] });
    expect(lines[0].responseTime_ms).toBeGreaterThanOrEqual(0);
    expect(JSON.stringify(lines)).not.toContain("secret");
  });

  it("logs nothing when the level is above info", async () => {
    const { app, lines } = appLoggingAt("warn");
    await supertest(app).get("/api/thing");
    expect(lines).toHaveLength(0);
  });
});
