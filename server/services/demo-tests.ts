import { rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import type { TestMethod } from "../../shared/schemas/boil-off-test";
import type { Prediction } from "../../shared/design/prediction";
import { gaussianNoise } from "../../shared/seeded-noise";
import { boilOff, type CryogenId } from "../../shared/thermal";
import * as accounts from "../db/repositories/accounts";
import { listTests } from "../db/repositories/boil-off-tests";
import { findRevision, listDesigns } from "../db/repositories/designs";
import { DEMO_ORGANIZATION, DEMO_USERS } from "../db/seed/demo";
import { newId } from "../ids";
import { acceptTest, createTest } from "./boil-off-tests";
import type { Actor, ServiceContext } from "./context";
import { DEMO_DESIGN_NAMES } from "./demo-designs";
import { ingestLog } from "./test-logs";

/**
 * The invented demo lab's boil-off tests (PRODUCT.md). Every reading is generated here from the
 * design's own prediction times an invented ratio, plus an invented cool-down transient and
 * invented noise: the 180 L nitrogen dewar weighed for 48 h close to its prediction (accepted),
 * the helium cryostat's vent flow (analysed), and the detector dewar's level gauge running 40 %
 * over its prediction (accepted, so it raises an alert and e-mails the owners and engineers).
 */
interface DemoLog {
  design: (typeof DEMO_DESIGN_NAMES)[number];
  vesselLabel: string;
  method: TestMethod;
  ratio: number;
  hours: number;
  stepSeconds: number;
  accept: boolean;
  notes: string;
}

const LOGS: DemoLog[] = [
  { design: DEMO_DESIGN_NAMES[1], vesselLabel: "Storage dewar SD-180", method: "weighing", ratio: 1.04, hours: 48, stepSeconds: 60, accept: true, notes: "Weighed on the floor scale after a full fill; first hours are the neck cooling down. (Demo data, invented.)" },
  { design: DEMO_DESIGN_NAMES[0], vesselLabel: "Magnet cryostat MC-250", method: "vent-flow", ratio: 1.1, hours: 24, stepSeconds: 30, accept: false, notes: "Vent flowmeter on the helium exhaust, normal litres at 0 °C. (Demo data, invented.)" },
  { design: DEMO_DESIGN_NAMES[2], vesselLabel: "Detector dewar DD-3", method: "level", ratio: 1.4, hours: 12, stepSeconds: 60, accept: true, notes: "Level gauge log after the dewar was bumped in transport. (Demo data, invented.)" },
];


/** The CSV a logger would write for this vessel: its boil-off signal from the engine's boilOff. */
function demoCsv(log: DemoLog, heat_W: number, cryogen: CryogenId, capacity_L: number | null): string {
  const b = boilOff({ heat_W, cryogen, capacity_L: capacity_L ?? undefined });
  const noise = gaussianNoise(Math.round(heat_W * 1e6));
  const n = Math.round((log.hours * 3600) / log.stepSeconds) + 1;
  const start = Date.parse("2026-11-02T08:00:00Z");
  const lines: string[] = [];
  // Invented cool-down: extra boil-off that halves every 40 minutes after the fill.
  const extra = (t: number) => 1.5 * Math.exp((-t * Math.LN2) / 2400);
  if (log.method === "weighing") {
    lines.push("timestamp,gross mass (kg),barometer (hPa)");
    let mass = 148.2;
    for (let i = 0; i < n; i++) {
      const t = i * log.stepSeconds;
      if (i > 0) mass -= (b.ventedMass_kg_per_h / 3600) * log.stepSeconds * (1 + extra(t));
      const p = 1012 + 4 * Math.sin((2 * Math.PI * t) / 86_400) + 0.2 * noise();
      lines.push(`${new Date(start + t * 1000).toISOString()},${(mass + 0.002 * noise()).toFixed(3)},${p.toFixed(1)}`);
    }
  } else if (log.method === "vent-flow") {
    lines.push("elapsed_s,flow (L/min)");
    for (let i = 0; i < n; i++) {
      const t = i * log.stepSeconds;
      const flow = b.ventFlow_standard_L_per_min * (1 + extra(t)) * (1 + 0.02 * noise());
      lines.push(`${t},${flow.toFixed(4)}`);
    }
  } else {
    lines.push("time,level (%)");
    let level = 98;
    for (let i = 0; i < n; i++) {
      const t = i * log.stepSeconds;
      if (i > 0) level -= (b.evaporationRate_percent_per_day! / 86_400) * log.stepSeconds * (1 + extra(t));
      lines.push(`${new Date(start + t * 1000).toISOString().replace(".000Z", "Z")},${(level + 0.03 * noise()).toFixed(3)}`);
    }
  }
  return `${lines.join("\n")}\n`;
}

async function demoActor(ctx: ServiceContext, email: string): Promise<Actor | null> {
  const user = await accounts.findUserByEmail(ctx.db, email);
  const account = user ? await accounts.findAccountByUserId(ctx.db, user.id) : null;
  if (!account || account.organization.name !== DEMO_ORGANIZATION) return null;
  return { userId: account.user.id, organizationId: account.organization.id, role: account.membership.role, sessionId: "seed" };
}

/** Seeds the demo tests once, as the demo technician (the engineer accepts); a second run finds them and stops. */
export async function seedDemoTests(ctx: ServiceContext): Promise<boolean> {
  const technician = await demoActor(ctx, DEMO_USERS[2].email);
  const engineer = await demoActor(ctx, DEMO_USERS[1].email);
  if (!technician || !engineer) return false;
  if ((await listTests(ctx.db, technician.organizationId)).length > 0) return false;
  const designs = await listDesigns(ctx.db, technician.organizationId);
  for (const log of LOGS) {
    const design = designs.find((d) => d.design.name === log.design)?.design;
    if (!design) continue;
    const revision = await findRevision(ctx.db, technician.organizationId, design.id, design.latestRevision);
    const prediction = revision?.revision.prediction as Prediction | undefined;
    const cold = prediction?.result.stages.at(-1);
    if (!cold || !(cold.net_W > 0)) continue;
    const test = await createTest(ctx, technician, { designId: design.id, revision: design.latestRevision, method: log.method, vesselLabel: log.vesselLabel, notes: log.notes, ambientTemperature_K: 294 });
    const csv = demoCsv(log, cold.net_W * log.ratio, test.cryogen, test.capacity_L);
    const file = path.join(os.tmpdir(), `frostfold-demo-${newId()}.csv`);
    await writeFile(file, csv);
    try {
      const [timeColumn, valueColumn, pressureColumn] = csv.slice(0, csv.indexOf("\n")).split(",");
      await ingestLog(ctx, technician, test.id, { path: file, originalName: `${log.vesselLabel.toLowerCase().replace(/\W+/g, "-")}.csv`, size: Buffer.byteLength(csv) }, {
        timeColumn,
        valueColumn,
        valueUnit: log.method === "weighing" ? "kg" : log.method === "vent-flow" ? "standard-L/min" : "percent",
        timeFormat: log.method === "vent-flow" ? "seconds" : "iso",
        ...(pressureColumn ? { pressureColumn, pressureUnit: "hPa" as const } : {}),
      });
    } finally {
      await rm(file, { force: true });
    }
    if (log.accept) await acceptTest(ctx, engineer, test.id);
  }
  return true;
}
