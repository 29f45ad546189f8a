import { createHash } from "node:crypto";
import type supertest from "supertest";
import { expect } from "vitest";
import { DesignDetailSchema } from "../../shared/schemas/design";
import { TestDetailSchema, type TestDetail } from "../../shared/schemas/boil-off-test";
import { gaussianNoise } from "../../shared/seeded-noise";
import { countRows } from "./database";
import { panelContent } from "./designs";
import type { TestApp } from "./test-app";

/**
 * Helpers for the boil-off test API tests: a small design to test against, invented logger
 * files generated in the test (a known rate plus seeded noise), the upload call, and what is
 * left behind (rows and objects in the S3 fake).
 */
export type Agent = ReturnType<TestApp["agent"]>;


export { panelContent };

/** Creates a design through the API (as whoever `agent` is) and returns it with its cold stage's predicted heat. */
export async function createDesign(agent: Agent, name = "Test panel", options: Parameters<typeof panelContent>[1] = {}) {
  const res = await agent.post("/api/designs").send({ name, content: await panelContent(agent, options) });
  expect(res.status).toBe(201);
  const design = DesignDetailSchema.parse(res.body);
  const stages = design.latest.prediction.result.stages;
  return { design, predicted_W: stages[stages.length - 1].net_W };
}

export async function createTest(agent: Agent, body: Record<string, unknown>): Promise<TestDetail> {
  const res = await agent.post("/api/boil-off-tests").send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return TestDetailSchema.parse(res.body);
}

/** The same invented noise on every run. */
export const gaussian = gaussianNoise;

export interface WeighingLog {
  csv: string;
  /** The invented true slope, kg/s (negative: mass falls). */
  rate_kg_per_s: number;
  time_s: number[];
  mass_kg: number[];
}

/**
 * An invented weighing log: mass = m0 + rate·t + N(0, noise), one reading every step_s, ISO
 * timestamps from 2026-11-02 08:00 UTC (or elapsed seconds), optionally a barometer in hPa.
 */
export function weighingLog(options: { rate_kg_per_s: number; readings?: number; step_s?: number; noise_kg?: number; seed?: number; time?: "iso" | "seconds"; barometer?: boolean; startMass_kg?: number }): WeighingLog {
  const n = options.readings ?? 500;
  const step = options.step_s ?? 60;
  const noise = gaussian(options.seed ?? 1);
  const sigma = options.noise_kg ?? 0.002;
  const start = Date.parse("2026-11-02T08:00:00Z");
  const lines = [options.time === "seconds" ? "elapsed_s,mass (kg)" : `timestamp,mass (kg)${options.barometer ? ",barometer (hPa)" : ""}`];
  const time_s: number[] = [];
  const mass_kg: number[] = [];
  for (let i = 0; i < n; i++) {
    const t = i * step;
    const m = (options.startMass_kg ?? 150) + options.rate_kg_per_s * t + sigma * noise();
    time_s.push(t);
    mass_kg.push(Number(m.toFixed(5)));
    const when = options.time === "seconds" ? String(t) : new Date(start + t * 1000).toISOString();
    lines.push(`${when},${m.toFixed(5)}${options.barometer ? `,${(1013.2 + 0.5 * Math.sin(t / 5000)).toFixed(1)}` : ""}`);
  }
  return { csv: `${lines.join("\n")}\n`, rate_kg_per_s: options.rate_kg_per_s, time_s, mass_kg };
}

export const sha256 = (data: string | Buffer) => createHash("sha256").update(data).digest("hex");

/** POST /api/boil-off-tests/:id/logs with the file and the mapping's form fields. */
export function uploadLog(agent: Agent, testId: string, file: string | Buffer, fields: Record<string, string>, filename = "log.csv"): supertest.Test {
  let req = agent.post(`/api/boil-off-tests/${testId}/logs`);
  for (const [name, value] of Object.entries(fields)) req = req.field(name, value);
  return req.attach("file", Buffer.isBuffer(file) ? file : Buffer.from(file), { filename, contentType: "text/csv" });
}

export const WEIGHING_FIELDS = { timeColumn: "timestamp", valueColumn: "mass (kg)", valueUnit: "kg" } as const;

/** What a refused upload must leave behind: exactly what was there before it. */
export async function storedState(t: TestApp) {
  return {
    files: await countRows(t.ctx.db, "boil_off_test_files"),
    audit: await countRows(t.ctx.db, "audit_log"),
    objects: (await t.ctx.objects.list()).length,
    tests: (await t.ctx.db.query.boilOffTests.findMany()).map((r) => ({ id: r.id, status: r.status, log: r.log, analysis: r.analysis, window: [r.windowStart_s, r.windowEnd_s] })),
  };
}
