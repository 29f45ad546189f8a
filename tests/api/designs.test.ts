import { describe, expect, it } from "vitest";
import { predictDesign } from "../../shared/design/predict";
import { DesignContentSchema, DesignDetailSchema, RevisionDetailSchema, type DesignContentInput } from "../../shared/schemas/design";
import { resolveDesignMaterials } from "../../server/services/design-materials";
import { countRows } from "../support/database";
import { libraryRef, panelContent } from "../support/designs";
import { useTestApp } from "../support/test-app";

const t = useTestApp();

const ref = async (materialId: string) => libraryRef(await t.signInAs("viewer"), materialId);

/** A flat panel between a 300 K wall and liquid nitrogen, with one radiation block and a 1 W target. */
const panel = async (layers = 10): Promise<DesignContentInput> => panelContent(await t.signInAs("viewer"), { layers, targetColdHeat_W: 1 });

async function createAs(role: "engineer" | "owner", name = "Test panel", layers = 10) {
  const agent = await t.signInAs(role);
  const res = await agent.post("/api/designs").send({ name, content: await panel(layers) });
  expect(res.status).toBe(201);
  return { agent, design: DesignDetailSchema.parse(res.body) };
}

describe("POST /api/designs", () => {
  it("stores revision 1 whose prediction equals the engine called directly on the same inputs", async () => {
    const { design } = await createAs("engineer");
    expect(design.latestRevision).toBe(1);
    const content = DesignContentSchema.parse(await panel());
    const { lookup } = await resolveDesignMaterials(t.ctx.db, (await t.ctx.db.query.designs.findFirst())!.organizationId, content);
    const direct = predictDesign(content, lookup);
    expect(design.latest.prediction.coldHeat_W).toBeCloseTo(direct.coldHeat_W, 12);
    expect(design.latest.prediction.result.shields.map((s) => s.temperature_K)).toEqual(direct.result.shields.map((s) => s.temperature_K));
    expect(design.coldHeat_W).toBeCloseTo(direct.coldHeat_W, 12);
    expect(design.latest.materials.map((m) => m.materialId).sort()).toEqual(["seed-cryogen-nitrogen", "seed-reflector-al-polyester", "seed-wall-ss304-polished"]);
    expect(design.latest.materials.every((m) => m.source.length > 0)).toBe(true);
  });

  it("names every bad field with its range and writes nothing", async () => {
    const agent = await t.signInAs("engineer");
    const content = await panel();
    const bad = { ...content, layup: [{ ...content.layup[0], layers: 0 }], warm: { ...content.warm, temperature_K: -5 } };
    const res = await agent.post("/api/designs").send({ name: "X", content: bad });
    expect(res.status).toBe(400);
    const fields = res.body.error.fields as { path: string; message: string }[];
    expect(fields.map((f) => f.path).sort()).toEqual(["content.layup.0.layers", "content.warm.temperature_K", "name"]);
    expect(fields.find((f) => f.path === "content.layup.0.layers")?.message).toBe("layers must be a whole number from 1 to 1000");
    expect(await countRows(t.ctx.db, "designs")).toBe(0);
    expect(await countRows(t.ctx.db, "design_revisions")).toBe(0);
  });

  it("refuses a library entry of the wrong kind, naming the field", async () => {
    const agent = await t.signInAs("engineer");
    const content = await panel();
    const res = await agent.post("/api/designs").send({ name: "Wrong kind", content: { ...content, warm: { ...content.warm, finish: await ref("seed-reflector-al-polyester") } } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].path).toBe("warm.finish");
    expect(await countRows(t.ctx.db, "designs")).toBe(0);
  });

  it("refuses a draft library version: designs use approved versions only", async () => {
    const agent = await t.signInAs("engineer");
    const copy = await agent.post("/api/materials/seed-wall-ss304-polished/copy").send({ name: "Our stainless finish" });
    expect(copy.status).toBe(201);
    const content = await panel();
    const res = await agent.post("/api/designs").send({ name: "Draft finish", content: { ...content, warm: { ...content.warm, finish: { materialId: copy.body.id, version: 1 } } } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].path).toBe("warm.finish");
    expect(res.body.error.message).toMatch(/approved/);
  });
});

describe("roles", () => {
  it("technicians and viewers read designs but cannot create, revise or duplicate them", async () => {
    const { design } = await createAs("engineer");
    for (const role of ["technician", "viewer"] as const) {
      const agent = await t.signInAs(role);
      expect((await agent.get("/api/designs")).body.designs).toHaveLength(1);
      expect((await agent.get(`/api/designs/${design.id}`)).status).toBe(200);
      expect((await agent.post("/api/designs").send({ name: "Nope", content: await panel() })).status).toBe(403);
      expect((await agent.post(`/api/designs/${design.id}/revisions`).send({ baseRevision: 1, content: await panel(12), changeNote: "x" })).status).toBe(403);
      expect((await agent.post(`/api/designs/${design.id}/duplicate`).send({})).status).toBe(403);
      expect((await agent.post("/api/estimate").send({ content: await panel() })).status).toBe(200);
    }
    expect(await countRows(t.ctx.db, "designs")).toBe(1);
    expect((await t.agent().get("/api/designs")).status).toBe(401);
  });
});

describe("POST /api/designs/:id/revisions", () => {
  it("saves revision 2 with its note and writes the audit log", async () => {
    const { agent, design } = await createAs("engineer");
    const res = await agent.post(`/api/designs/${design.id}/revisions`).send({ baseRevision: 1, content: await panel(20), changeNote: "Twenty layers" });
    expect(res.status).toBe(201);
    const rev = RevisionDetailSchema.parse(res.body);
    expect(rev.revision).toBe(2);
    expect(rev.prediction.coldHeat_W).toBeLessThan(design.latest.prediction.coldHeat_W);
    const detail = DesignDetailSchema.parse((await agent.get(`/api/designs/${design.id}`)).body);
    expect(detail.revisions.map((r) => r.revision)).toEqual([2, 1]);
    expect(detail.revisions[0].changeNote).toBe("Twenty layers");
    // Revision 1 is unchanged: revisions are immutable snapshots.
    const first = RevisionDetailSchema.parse((await agent.get(`/api/designs/${design.id}/revisions/1`)).body);
    expect(first.content.layup[0]).toMatchObject({ layers: 10 });
    const actions = (await t.ctx.db.query.auditLog.findMany()).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(["design.create", "design.revise"]));
  });

  it("answers a save on a stale base with 409 and stores nothing", async () => {
    const { agent, design } = await createAs("engineer");
    const owner = await t.signInAs("owner");
    expect((await owner.post(`/api/designs/${design.id}/revisions`).send({ baseRevision: 1, content: await panel(15), changeNote: "Owner's edit" })).status).toBe(201);
    const stale = await agent.post(`/api/designs/${design.id}/revisions`).send({ baseRevision: 1, content: await panel(30), changeNote: "Engineer's edit" });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("stale_revision");
    expect(stale.body.error.message).toMatch(/Revision 2 was saved after revision 1/);
    expect(await countRows(t.ctx.db, "design_revisions")).toBe(2);
  });

  it("requires a change note", async () => {
    const { agent, design } = await createAs("engineer");
    const res = await agent.post(`/api/designs/${design.id}/revisions`).send({ baseRevision: 1, content: await panel(12) });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0]).toEqual({ path: "changeNote", message: "changeNote is required: say what changed" });
  });
});

describe("duplicate, estimate, compare and report", () => {
  it("duplicates the latest revision into a new design", async () => {
    const { agent, design } = await createAs("engineer");
    const res = await agent.post(`/api/designs/${design.id}/duplicate`).send({ name: "Panel, variant B" });
    expect(res.status).toBe(201);
    expect(res.body.name).toBe("Panel, variant B");
    expect(res.body.latest.content).toEqual(design.latest.content);
    expect(res.body.coldHeat_W).toBeCloseTo(design.coldHeat_W!, 12);
  });

  it("estimates without storing anything", async () => {
    const agent = await t.signInAs("engineer");
    const res = await agent.post("/api/estimate").send({ content: await panel() });
    expect(res.status).toBe(200);
    expect(res.body.prediction.coldHeat_W).toBeGreaterThan(0);
    expect(res.body.prediction.sweep.points.length).toBeGreaterThan(5);
    // The quick figures of a live edit: the same heat, no sweep.
    const figures = await agent.post("/api/estimate").send({ content: await panel(), sweep: false });
    expect(figures.status).toBe(200);
    expect(figures.body.prediction.sweep).toBeNull();
    expect(figures.body.prediction.coldHeat_W).toBe(res.body.prediction.coldHeat_W);
    const bad = await agent.post("/api/estimate").send({ content: await panel(), sweep: "yes" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.map((f: { path: string }) => f.path)).toEqual(["sweep"]);
    expect(await countRows(t.ctx.db, "designs")).toBe(0);
  });

  it("refuses an estimate the engine cannot make with a 400 whose path is the form's field", async () => {
    const agent = await t.signInAs("engineer");
    const content = await panel();
    const steel = content.warm.finish;
    // A cooled stage warmer than the warm wall: the engine names layup[1].temperature_K.
    const stage = { kind: "stage" as const, label: "Too warm", temperature_K: 320, finish: steel };
    const res = await agent.post("/api/estimate").send({ content: { ...content, layup: [content.layup[0], stage, content.layup[0]] } });
    expect(res.status).toBe(400);
    const fields = res.body.error.fields as { path: string; message: string }[];
    expect(fields.map((f) => f.path)).toEqual(["layup.1.temperature_K"]);
    expect(fields[0].message).toMatch(/layup\[1\]\.temperature_K/);
  });

  it("reads the estimate body itself: bad JSON, no body and a bad origin are refused as everywhere else", async () => {
    const agent = await t.signInAs("engineer");
    const malformed = await agent.post("/api/estimate").set("Content-Type", "application/json").send('{"content": {');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.code).toBe("invalid_json");
    // No JSON body at all reads as {}: validation names the missing field.
    const empty = await agent.post("/api/estimate").set("Content-Type", "text/plain").send("hello");
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields.map((f: { path: string }) => f.path)).toEqual(["content"]);
    // The same design in other whitespace is the same question: the same answer.
    const content = await panel();
    const compact = await agent.post("/api/estimate").set("Content-Type", "application/json").send(JSON.stringify({ content, sweep: false }));
    const spaced = await agent.post("/api/estimate").set("Content-Type", "application/json").send(JSON.stringify({ content, sweep: false }, null, 2));
    expect(spaced.status).toBe(200);
    expect(spaced.body).toEqual(compact.body);
    const foreign = await agent.post("/api/estimate").set("Origin", "https://elsewhere.example").send({ content });
    expect(foreign.status).toBe(403);
    expect((await t.agent().post("/api/estimate").send({ content })).status).toBe(401);
  });

  it("compares designs, with yearly cryogen cost at the given price", async () => {
    const { agent, design: a } = await createAs("engineer", "Panel A", 10);
    const { design: b } = await createAs("engineer", "Panel B", 30);
    const res = await agent.get(`/api/compare?ids=${a.id},${b.id}:1&price_per_L=2`);
    expect(res.status).toBe(200);
    const [ia, ib] = res.body.items;
    expect(ia.name).toBe("Panel A");
    expect(ib.stages.at(-1).heatIn_W).toBeLessThan(ia.stages.at(-1).heatIn_W);
    // yearly L = L/day × 365.25; cost = yearly L × price (arithmetic of the definition).
    expect(ia.yearlyBoilOff_L).toBeCloseTo(ia.stages.at(-1).boilOff_L_per_day * 365.25, 9);
    expect(ia.yearlyCryogenCost).toBeCloseTo(ia.yearlyBoilOff_L * 2, 9);
    const one = await agent.get(`/api/compare?ids=${a.id}`);
    expect(one.status).toBe(400);
    expect(one.body.error.fields[0].message).toBe("ids must name 2 to 6 designs");
  });

  it("serves a PDF report that names the design", async () => {
    const { agent, design } = await createAs("engineer", "Report panel");
    const res = await agent.get(`/api/designs/${design.id}/revisions/1/report.pdf`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    expect(res.headers["content-disposition"]).toMatch(/frostfold-report-panel-rev1\.pdf/);
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    expect(pdf.toString("latin1")).toContain("Report panel");
  });
});

describe("a second organization", () => {
  it("can neither list, read, revise, duplicate, compare nor print the first one's designs", async () => {
    const { design } = await createAs("engineer");
    const other = (await t.signUpOtherOrganization()).agent;
    expect((await other.get("/api/designs")).body.designs).toEqual([]);
    expect((await other.get(`/api/designs/${design.id}`)).status).toBe(404);
    expect((await other.get(`/api/designs/${design.id}/revisions/1`)).status).toBe(404);
    expect((await other.post(`/api/designs/${design.id}/revisions`).send({ baseRevision: 1, content: await panel(12), changeNote: "x" })).status).toBe(404);
    expect((await other.post(`/api/designs/${design.id}/duplicate`).send({})).status).toBe(404);
    expect((await other.get(`/api/designs/${design.id}/revisions/1/report.pdf`)).status).toBe(404);
    expect((await other.get(`/api/compare?ids=${design.id},${design.id}`)).status).toBe(404);
    expect(await countRows(t.ctx.db, "design_revisions")).toBe(1);
  });
});
