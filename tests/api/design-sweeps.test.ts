import { describe, expect, it } from "vitest";
import { toAssembly } from "../../shared/design/to-assembly";
import { ROLES } from "../../shared/permissions";
import { DesignContentSchema, SweepResultSchema, type DesignContentInput, type SweepResult } from "../../shared/schemas/design";
import { CRYOGENS } from "../../shared/thermal/fluids";
import { sweepLayerDensity, sweepPressure, sweepWarmTemperature, type SweepPoint } from "../../shared/thermal/sweeps";
import { resolveDesignMaterials } from "../../server/services/design-materials";
import { libraryRef, panelContent } from "../support/designs";
import { useTestApp, type TestApp } from "../support/test-app";

const t = useTestApp();

type Agent = ReturnType<TestApp["agent"]>;

const ref = async (materialId: string) => libraryRef(await t.signInAs("viewer"), materialId);
const CORRELATION_ID = "seed-corr-kcg-1974-polyester-netting".slice(0, 32); // as the seed names it

/** A flat panel between a 300 K wall and liquid nitrogen, with one radiation block and a 1 W target. */
const panel = async (layers = 10): Promise<DesignContentInput> => panelContent(await t.signInAs("viewer"), { layers, targetColdHeat_W: 1 });

/**
 * A helium cylinder with a nitrogen-cooled shield: a correlation blanket outside the shield, a
 * layer-by-layer blanket inside it, a neck from the warm wall to the vessel and straps to the shield.
 */
async function cryostat(): Promise<DesignContentInput> {
  const steel = await ref("seed-wall-ss304-polished");
  const film = await ref("seed-reflector-al-polyester");
  return {
    geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.4, length_m: 1.2, flatEnds: 2 },
    warm: { temperature_K: 295, finish: steel },
    cold: { cryogen: await ref("seed-cryogen-helium-4"), finish: steel, capacity_L: 250, fillFraction: 0.9, minimumFraction: 0.1 },
    layup: [
      { kind: "block", label: "outer blanket", layers: 40, reflector: film, layerDensity_per_cm: 20, model: "correlation", correlationSet: await ref(CORRELATION_ID) },
      { kind: "stage", label: "nitrogen shield", temperature_K: 80, cryogen: await ref("seed-cryogen-nitrogen"), finish: await ref("seed-wall-copper-polished") },
      { kind: "block", label: "inner blanket", layers: 10, reflector: film, spacer: await ref("seed-spacer-polyester-netting"), layerDensity_per_cm: 15, model: "layers" },
    ],
    supports: [
      { label: "neck", material: await ref("seed-support-ss304"), area_m2: 5e-5, length_m: 0.5, count: 1, from: "warm", to: "cold" },
      { label: "shield straps", material: await ref("seed-support-g10-normal"), area_m2: 2e-4, length_m: 0.15, count: 3, from: "warm", to: 0 },
    ],
    vacuum: { pressure_Pa: 1e-4, gas: "helium" },
  };
}

const post = (agent: Agent, body: object) => agent.post("/api/estimate/sweep").send(body);

async function sweepOf(agent: Agent, body: object): Promise<SweepResult> {
  const res = await post(agent, body);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return SweepResultSchema.parse(res.body);
}

/** The engine's assembly of the same content, resolved against the demo organization's library. */
async function assemblyOf(input: DesignContentInput) {
  const content = DesignContentSchema.parse(input);
  const organizationId = (await t.ctx.db.query.organizations.findFirst())!.id;
  const { lookup } = await resolveDesignMaterials(t.ctx.db, organizationId, content);
  return toAssembly(content, lookup);
}

/** Each heat of each point at or above the one before; rounding may differ in the last bit only. */
function neverFalls(points: SweepPoint[], key: (p: SweepPoint) => number[]) {
  for (let i = 1; i < points.length; i++) {
    key(points[i]).forEach((q, j) => expect(q, `point ${i} (x = ${points[i].x}), heat ${j}`).toBeGreaterThanOrEqual(key(points[i - 1])[j] * (1 - 1e-12)));
  }
}
const allHeats = (p: SweepPoint) => [...p.heatIntoStages_W, p.coldHeat_W];

describe("POST /api/estimate/sweep", () => {
  it("sweeps layer density over 0.25× to 2× the block facing the vessel, equal to the engine called directly", async () => {
    const agent = await t.signInAs("engineer");
    const content = await cryostat();
    const sweep = await sweepOf(agent, { content, variable: "layer-density" });
    expect(sweep).toMatchObject({ variable: "layer-density", unit: "layers/cm", designValue: 15, blockIndex: 2, blockLabel: "inner blanket" });
    const direct = sweepLayerDensity(await assemblyOf(content), { blockIndex: 2, from: 3.75, to: 30, step: (30 - 3.75) / 40 });
    expect(sweep.points).toEqual(direct);
    expect(sweep.points).toHaveLength(41);
    // A given block: the correlation blanket outside the shield.
    const outer = await sweepOf(agent, { content, variable: "layer-density", blockIndex: 0 });
    expect(outer).toMatchObject({ designValue: 20, blockIndex: 0, blockLabel: "outer blanket" });
    expect(outer.points).toEqual(sweepLayerDensity(await assemblyOf(content), { blockIndex: 0, from: 5, to: 40, step: 35 / 40 }));
  });

  it("sweeps the warm wall from 1 K above the nitrogen shield to 350 K, equal to the engine, and a warmer wall never lowers a heat", async () => {
    const agent = await t.signInAs("engineer");
    const content = await cryostat();
    const sweep = await sweepOf(agent, { content, variable: "warm-temperature" });
    expect(sweep).toMatchObject({ variable: "warm-temperature", unit: "K", designValue: 295, blockIndex: null, stageLabels: ["nitrogen shield"] });
    const from = CRYOGENS.nitrogen.saturationTemperature_K + 1;
    expect(sweep.points[0].x).toBeCloseTo(from, 9);
    expect(sweep.points.at(-1)!.x).toBeCloseTo(350, 9);
    expect(sweep.points).toEqual(sweepWarmTemperature(await assemblyOf(content), { from, to: 350, step: (350 - from) / 40 }));
    neverFalls(sweep.points, allHeats);
    // The shield takes the radiation; the neck from the warm wall makes the vessel's heat rise too.
    expect(sweep.points.at(-1)!.heatIntoStages_W[0]).toBeGreaterThan(sweep.points[0].heatIntoStages_W[0]);
    expect(sweep.points.at(-1)!.coldHeat_W).toBeGreaterThan(sweep.points[0].coldHeat_W);
  });

  it("sweeps pressure from 1e-6 to 10 Pa at 6 points a decade, equal to the engine, and more gas never lowers a heat", async () => {
    const agent = await t.signInAs("engineer");
    const content = await cryostat();
    const sweep = await sweepOf(agent, { content, variable: "pressure" });
    expect(sweep).toMatchObject({ variable: "pressure", unit: "Pa", designValue: 1e-4 });
    expect(sweep.points).toHaveLength(43);
    expect(sweep.points).toEqual(sweepPressure(await assemblyOf(content), { from: 1e-6, to: 10, pointsPerDecade: 6 }));
    // Common practice: free-molecular gas conduction grows in proportion to the pressure.
    neverFalls(sweep.points, allHeats);
    expect(sweep.points.at(-1)!.coldHeat_W).toBeGreaterThan(sweep.points[0].coldHeat_W);
  });

  it("sweeps warm temperature and pressure of a radiation-only panel, and refuses its layer density naming variable", async () => {
    const agent = await t.signInAs("engineer");
    const content = await panel();
    const warm = await sweepOf(agent, { content, variable: "warm-temperature" });
    expect(warm.stageLabels).toEqual([]);
    expect(warm.points[0].heatIntoStages_W).toEqual([]);
    neverFalls(warm.points, allHeats);
    const res = await post(agent, { content, variable: "layer-density" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: "variable", message: expect.stringMatching(/layer-density does not apply.*pure radiation/) }]);
  });

  it("refuses an unknown variable, a blockIndex that is no correlation or layers block, and a bad design, naming the field", async () => {
    const agent = await t.signInAs("engineer");
    const content = await cryostat();
    const unknown = await post(agent, { content, variable: "length" });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields).toEqual([{ path: "variable", message: "variable must be one of layer-density, warm-temperature, pressure" }]);
    const missing = await post(agent, { content });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields.map((f: { path: string }) => f.path)).toEqual(["variable"]);
    for (const blockIndex of [1, 7]) {
      const res = await post(agent, { content, variable: "layer-density", blockIndex });
      expect(res.status).toBe(400);
      expect(res.body.error.fields[0]).toEqual({ path: "blockIndex", message: "blockIndex must be the layup index of a correlation or layers block (one of 0, 2)" });
    }
    const fraction = await post(agent, { content, variable: "layer-density", blockIndex: 0.5 });
    expect(fraction.status).toBe(400);
    expect(fraction.body.error.fields[0]).toEqual({ path: "blockIndex", message: "blockIndex must be a whole number from 0 to 49" });
    const bad = await post(agent, { content: { ...content, warm: { ...content.warm, temperature_K: -3 } }, variable: "pressure" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe("content.warm.temperature_K");
  });
});

describe("roles", () => {
  it.each(ROLES)("%s reads sweeps", async (role) => {
    const agent = await t.signInAs(role);
    for (const variable of ["layer-density", "warm-temperature", "pressure"]) {
      expect((await post(agent, { content: await cryostat(), variable })).status, variable).toBe(200);
    }
  });

  it("refuses a visitor who is not signed in", async () => {
    expect((await post(t.agent(), { content: await cryostat(), variable: "pressure" })).status).toBe(401);
  });
});

describe("a second organization", () => {
  it("cannot sweep with the first one's library entries", async () => {
    const owner = await t.signInAs("owner");
    const draft = await owner.post("/api/materials").send({
      name: "Blackened jacket (invented)",
      properties: { kind: "wall-finish", surface: { model: 0.3 } },
      validRange_K: { min: 77, max: 350 },
      source: { type: "memory", note: "invented for tests" },
    });
    expect(draft.status, JSON.stringify(draft.body)).toBe(201);
    expect((await owner.post(`/api/materials/${draft.body.id}/approval`).send({ decision: "approve" })).status).toBe(200);
    const content = await cryostat();
    content.warm.finish = { materialId: draft.body.id, version: 1 };
    expect((await post(owner, { content, variable: "pressure" })).status).toBe(200);

    const other = (await t.signUpOtherOrganization()).agent;
    const res = await post(other, { content, variable: "pressure" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: "warm.finish", message: expect.stringMatching(/not an approved library version this organization can use/) }]);
  });
});
