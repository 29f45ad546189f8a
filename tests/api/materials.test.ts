import { readFileSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { librarySeedEntries, seedLibrary } from "../../server/db/seed/library";
import { materialVersions } from "../../server/db/schema";
import { newId } from "../../server/ids";
import { ROLES, type Role } from "../../shared/permissions";
import { MATERIAL_CSV_MAX_BYTES, MaterialDetailSchema, MaterialListSchema, MaterialVersionSchema, type MaterialDetail } from "../../shared/schemas/material";
import { CORRELATION_SETS } from "../../shared/thermal/blanket-correlation";
import { CRYOGENS } from "../../shared/thermal/fluids";
import { SUPPORT_MATERIALS } from "../../shared/thermal/supports";
import { countRows } from "../support/database";
import { useTestApp, type TestApp } from "../support/test-app";

type Agent = ReturnType<TestApp["agent"]>;
const t = useTestApp();

const fixture = (name: string) => readFileSync(path.resolve("tests/fixtures/materials", name));
const SEED_COUNT = librarySeedEntries().length;

// Invented numbers for the tests: they describe no real surface.
const wallFinish = (name: string, model: unknown = 0.1, extra: Record<string, unknown> = {}) => ({
  name,
  properties: { kind: "wall-finish", surface: { model } },
  validRange_K: { min: 77, max: 300 },
  source: { type: "memory", note: "invented for tests" },
  ...extra,
});

async function create(agent: Agent, input: object): Promise<MaterialDetail> {
  const res = await agent.post("/api/materials").send(input);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return MaterialDetailSchema.parse(res.body);
}
async function createApproved(owner: Agent, input: object): Promise<MaterialDetail> {
  const draft = await create(owner, input);
  const res = await owner.post(`/api/materials/${draft.id}/approval`).send({ decision: "approve" });
  expect(res.status).toBe(200);
  return MaterialDetailSchema.parse(res.body);
}
const auditActions = async () => (await t.ctx.db.query.auditLog.findMany({ where: (a, { eq }) => eq(a.entityType, "material") })).map((a) => a.action);
const upload = (agent: Agent, file: Buffer, query = "", name = "library.csv") => agent.post(`/api/materials/import${query}`).attach("file", file, { filename: name, contentType: "text/csv" });

describe("the seed", () => {
  it("has at least 25 approved global entries, each with a named source", async () => {
    const list = MaterialListSchema.parse((await (await t.signInAs("viewer")).get("/api/materials")).body);
    const seed = list.materials.filter((m) => m.scope === "seed");
    expect(seed.length).toBeGreaterThanOrEqual(25);
    expect(seed.length).toBe(SEED_COUNT);
    for (const m of seed) {
      expect(m.status, m.name).toBe("approved");
      const s = m.shown.source;
      if (s.type === "citation") {
        expect(s.author.length, m.name).toBeGreaterThan(0);
        expect(s.title.length, m.name).toBeGreaterThan(0);
      } else {
        // A seed value that is not a citation must say it is remembered.
        expect(s.type, m.name).toBe("memory");
      }
    }
  });

  it("names what the issue asks for: films and foil at 4.2, 77 and 300 K, five wall finishes, three spacers", async () => {
    const list = MaterialListSchema.parse((await (await t.signInAs("viewer")).get("/api/materials?scope=seed")).body).materials;
    const byName = (pattern: RegExp) => list.filter((m) => pattern.test(m.name));
    for (const pattern of [/aluminium foil/i, /aluminized polyester film/i, /aluminized polyimide film/i]) {
      const [entry] = byName(pattern);
      expect(entry?.kind, String(pattern)).toBe("reflector");
      const p = entry.shown.properties;
      if (p.kind !== "reflector" || typeof p.warmSide.model !== "object" || p.warmSide.model.kind !== "table") throw new Error("expected a table model");
      expect(p.warmSide.model.points.map(([T]) => T)).toEqual([4.2, 77, 300]);
      expect(entry.shown.source.type === "citation" && entry.shown.source.fromMemory).toBe(true);
    }
    for (const pattern of [/copper/i, /gold/i, /silver/i, /304 stainless/i, /aluminium alloy/i]) {
      expect(byName(pattern).some((m) => m.kind === "wall-finish"), String(pattern)).toBe(true);
    }
    expect(list.filter((m) => m.kind === "spacer").map((m) => m.name).sort()).toEqual(["Glass-fiber paper", "Polyester netting", "Silk netting"]);
  });

  it("refers to the engine's conductivity fits, fluids and correlation sets rather than copying them loosely", async () => {
    const list = MaterialListSchema.parse((await (await t.signInAs("viewer")).get("/api/materials?scope=seed")).body).materials;
    const supports = list.filter((m) => m.kind === "support-material");
    expect(supports.map((m) => (m.shown.properties.kind === "support-material" ? m.shown.properties.supportMaterial : "")).sort()).toEqual(Object.keys(SUPPORT_MATERIALS).sort());
    for (const m of supports) {
      const p = m.shown.properties;
      if (p.kind !== "support-material") continue;
      expect(m.name).toBe(SUPPORT_MATERIALS[p.supportMaterial].label);
      expect([m.shown.validRange_K.min, m.shown.validRange_K.max]).toEqual(SUPPORT_MATERIALS[p.supportMaterial].validRange_K);
    }
    const cryogens = list.filter((m) => m.kind === "cryogen");
    expect(cryogens).toHaveLength(Object.keys(CRYOGENS).length);
    for (const m of cryogens) {
      const p = m.shown.properties;
      if (p.kind !== "cryogen") continue;
      const fluid = CRYOGENS[p.fluid];
      expect(p.latentHeat_J_per_kg).toBe(fluid.latentHeat_J_per_kg);
      expect(p.liquidDensity_kg_per_m3).toBe(fluid.liquidDensity_kg_per_m3);
      expect(m.shown.source.note).toBe(fluid.source);
      expect(m.shown.source.type === "citation" && m.shown.source.fromMemory).toBe(/from memory/i.test(fluid.source));
    }
    const sets = list.filter((m) => m.kind === "correlation-set");
    expect(sets).toHaveLength(CORRELATION_SETS.length);
    for (const set of CORRELATION_SETS) {
      const entry = sets.find((m) => m.shown.properties.kind === "correlation-set" && m.shown.properties.basedOn === set.id);
      expect(entry?.shown.properties.kind === "correlation-set" && entry.shown.properties.coefficients).toEqual(set.coefficients);
      expect(entry?.shown.source.note).toContain(set.provenance);
    }
  });

  it("is idempotent, and an engine table that changed adds a version while the old one still resolves", async () => {
    expect(await seedLibrary(t.ctx.db, { newId, now: new Date() })).toEqual({ inserted: 0, updated: 0 });
    expect(await countRows(t.ctx.db, "material_versions")).toBe(SEED_COUNT);
    // Make the stored version differ from what the engine's table now says.
    await t.ctx.db.update(materialVersions).set({ validMaxK: 290 }).where(eq(materialVersions.materialId, "seed-support-ptfe"));
    expect(await seedLibrary(t.ctx.db, { newId, now: new Date() })).toEqual({ inserted: 0, updated: 1 });
    const viewer = await t.signInAs("viewer");
    const detail = MaterialDetailSchema.parse((await viewer.get("/api/materials/seed-support-ptfe")).body);
    expect(detail.currentVersion).toBe(2);
    expect(detail.shown.validRange_K.max).toBe(300);
    const old = MaterialVersionSchema.parse((await viewer.get("/api/materials/seed-support-ptfe/versions/1")).body);
    expect(old.validRange_K.max).toBe(290);
  });
});

describe("library routes, role by role", () => {
  const expected: Record<Role, { propose: boolean; approve: boolean; retire: boolean }> = {
    owner: { propose: true, approve: true, retire: true },
    engineer: { propose: true, approve: false, retire: false },
    technician: { propose: false, approve: false, retire: false },
    viewer: { propose: false, approve: false, retire: false },
  };

  for (const role of ROLES) {
    const e = expected[role];
    it(`${role}: reads everything${e.propose ? ", proposes" : ""}${e.approve ? ", approves" : ""}${e.retire ? ", retires" : ""} and is refused the rest`, async () => {
      const owner = await t.signInAs("owner");
      const approved = await createApproved(owner, wallFinish("Approved wall (invented)"));
      const draft = await create(owner, wallFinish("Draft wall (invented)"));
      const before = await countRows(t.ctx.db, "material_versions");
      const agent = await t.signInAs(role);

      for (const url of ["/api/materials", `/api/materials/${approved.id}`, `/api/materials/${approved.id}/versions/1`, "/api/materials/export.csv", "/api/cryogens"]) {
        expect((await agent.get(url)).status, url).toBe(200);
      }
      const want = (allowed: boolean, ok: number) => (allowed ? ok : 403);
      expect((await agent.post("/api/materials").send(wallFinish(`New by ${role} (invented)`))).status).toBe(want(e.propose, 201));
      expect((await agent.put(`/api/materials/${draft.id}/versions/1`).send(wallFinish("Draft wall (invented)", 0.2))).status).toBe(want(e.propose, 200));
      expect((await agent.post(`/api/materials/${approved.id}/versions`).send(wallFinish("Approved wall (invented)", 0.3, { changeNote: "rework" }))).status).toBe(want(e.propose, 201));
      expect((await agent.post(`/api/materials/seed-wall-gold/copy`).send({})).status).toBe(want(e.propose, 201));
      expect((await upload(agent, fixture("valid.csv"), "?dryRun=true")).status).toBe(want(e.propose, 200));
      expect((await agent.post(`/api/materials/${draft.id}/approval`).send({ decision: "approve" })).status).toBe(want(e.approve, 200));
      expect((await agent.post(`/api/materials/${approved.id}/retire`).send({})).status).toBe(want(e.retire, 200));
      if (!e.propose) expect(await countRows(t.ctx.db, "material_versions")).toBe(before);
    });
  }

  it("without a session every library route gives 401", async () => {
    const anon = t.agent();
    expect((await anon.get("/api/materials")).status).toBe(401);
    expect((await anon.get("/api/materials/seed-wall-gold")).status).toBe(401);
    expect((await anon.get("/api/materials/export.csv")).status).toBe(401);
    expect((await anon.post("/api/materials").send(wallFinish("X (invented)"))).status).toBe(401);
    expect((await anon.post("/api/materials/seed-wall-gold/approval").send({ decision: "approve" })).status).toBe(401);
    expect((await upload(anon, fixture("valid.csv"))).status).toBe(401);
    expect((await anon.get("/api/cryogens")).status).toBe(401);
  });
});

describe("proposing, approving, rejecting and retiring", () => {
  it("walks an entry through drafts and decisions, keeping every version", async () => {
    const engineer = await t.signInAs("engineer");
    const owner = await t.signInAs("owner");
    const v1 = await create(engineer, wallFinish("Lab wall (invented)", 0.1));
    expect(v1).toMatchObject({ status: "draft", scope: "organization", currentVersion: null, draftVersion: 1, pickable: false });
    expect(v1.shown).toMatchObject({ status: "draft", proposedBy: "Tomas Lindqvist", changeNote: "First version" });

    expect((await engineer.post(`/api/materials/${v1.id}/approval`).send({ decision: "approve" })).status).toBe(403);
    const approved = MaterialDetailSchema.parse((await owner.post(`/api/materials/${v1.id}/approval`).send({ decision: "approve", version: 1 })).body);
    expect(approved).toMatchObject({ status: "approved", currentVersion: 1, draftVersion: null, pickable: true });
    expect(approved.shown).toMatchObject({ status: "approved", isCurrent: true, decidedBy: "Maren Okafor" });

    // An approved version is history: it cannot be edited, only superseded.
    const edit = await engineer.put(`/api/materials/${v1.id}/versions/1`).send(wallFinish("Lab wall (invented)", 0.5));
    expect(edit.status).toBe(409);
    expect(edit.body.error.code).toBe("version_immutable");
    const noNote = await engineer.post(`/api/materials/${v1.id}/versions`).send(wallFinish("Lab wall (invented)", 0.2));
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields[0].path).toBe("changeNote");

    const v2 = MaterialDetailSchema.parse((await engineer.post(`/api/materials/${v1.id}/versions`).send(wallFinish("Lab wall (invented)", 0.2, { changeNote: "remeasured" }))).body);
    expect(v2).toMatchObject({ status: "approved", currentVersion: 1, latestVersion: 2, draftVersion: 2 });
    expect(v2.shown.version).toBe(1);
    const second = await engineer.post(`/api/materials/${v1.id}/versions`).send(wallFinish("Lab wall (invented)", 0.25, { changeNote: "again" }));
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe("draft_open");
    expect((await engineer.put(`/api/materials/${v1.id}/versions/2`).send(wallFinish("Lab wall (invented)", 0.21))).status).toBe(200);

    const noReason = await owner.post(`/api/materials/${v1.id}/approval`).send({ decision: "reject" });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.message).toMatch(/comment is required when rejecting/);
    const rejected = MaterialDetailSchema.parse((await owner.post(`/api/materials/${v1.id}/approval`).send({ decision: "reject", comment: "Which test?" })).body);
    expect(rejected).toMatchObject({ status: "approved", currentVersion: 1, draftVersion: null });
    expect(rejected.versions.map((v) => [v.version, v.status])).toEqual([[2, "rejected"], [1, "approved"]]);
    expect(rejected.versions[0]).toMatchObject({ decisionComment: "Which test?", decidedBy: "Maren Okafor", changeNote: "remeasured" });

    await engineer.post(`/api/materials/${v1.id}/versions`).send(wallFinish("Lab wall, cleaned (invented)", 0.15, { changeNote: "after cleaning" }));
    const v3 = MaterialDetailSchema.parse((await owner.post(`/api/materials/${v1.id}/approval`).send({ decision: "approve" })).body);
    expect(v3).toMatchObject({ currentVersion: 3, name: "Lab wall, cleaned (invented)" });
    const first = MaterialVersionSchema.parse((await engineer.get(`/api/materials/${v1.id}/versions/1`).expect(200)).body);
    expect(first.properties).toEqual({ kind: "wall-finish", surface: { model: 0.1 } });
    expect(first.isCurrent).toBe(false);

    const retired = MaterialDetailSchema.parse((await owner.post(`/api/materials/${v1.id}/retire`).send({ comment: "replaced by the new jacket" })).body);
    expect(retired).toMatchObject({ status: "retired", pickable: false, retired: { by: "Maren Okafor", comment: "replaced by the new jacket" } });
    expect((await engineer.get(`/api/materials/${v1.id}/versions/3`)).status).toBe(200);
    expect((await engineer.post(`/api/materials/${v1.id}/versions`).send(wallFinish("Lab wall (invented)", 0.3, { changeNote: "late" }))).body.error.code).toBe("retired");
    expect((await owner.post(`/api/materials/${v1.id}/retire`).send({})).status).toBe(409);
    const pickable = MaterialListSchema.parse((await engineer.get("/api/materials?status=approved&scope=organization")).body);
    expect(pickable.materials.map((m) => m.id)).not.toContain(v1.id);
    expect(MaterialListSchema.parse((await engineer.get("/api/materials?status=retired")).body).materials.map((m) => m.id)).toEqual([v1.id]);

    expect(await auditActions()).toEqual(
      expect.arrayContaining(["material.create", "material.approve", "material.propose", "material.edit_draft", "material.reject", "material.retire"]),
    );
  });

  it("a never-approved draft that is rejected stays, marked rejected; it cannot be retired", async () => {
    const owner = await t.signInAs("owner");
    const draft = await create(owner, wallFinish("Doubtful wall (invented)"));
    expect((await owner.post(`/api/materials/${draft.id}/retire`).send({})).body.error.code).toBe("not_approved");
    // The owner decides on the draft they looked at, not one that replaced it meanwhile.
    expect((await owner.post(`/api/materials/${draft.id}/approval`).send({ decision: "approve", version: 2 })).body.error.code).toBe("stale_draft");
    const res = MaterialDetailSchema.parse((await owner.post(`/api/materials/${draft.id}/approval`).send({ decision: "reject", comment: "no source" })).body);
    expect(res).toMatchObject({ status: "rejected", currentVersion: null, draftVersion: null });
    expect((await owner.post(`/api/materials/${draft.id}/approval`).send({ decision: "approve" })).body.error.code).toBe("no_draft");
  });

  it("retiring closes an open draft, saying why", async () => {
    const owner = await t.signInAs("owner");
    const entry = await createApproved(owner, wallFinish("Old wall (invented)"));
    await owner.post(`/api/materials/${entry.id}/versions`).send(wallFinish("Old wall (invented)", 0.2, { changeNote: "change" }));
    const retired = MaterialDetailSchema.parse((await owner.post(`/api/materials/${entry.id}/retire`).send({})).body);
    expect(retired.versions[0]).toMatchObject({ version: 2, status: "rejected", decisionComment: "Rejected because the entry was retired." });
  });

  it("refuses a change of kind and a name already in the library", async () => {
    const owner = await t.signInAs("owner");
    const entry = await createApproved(owner, wallFinish("Kind wall (invented)"));
    const res = await owner.post(`/api/materials/${entry.id}/versions`).send({ ...wallFinish("Kind wall (invented)"), changeNote: "x", properties: { kind: "spacer", form: "paper" } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: "properties.kind", message: expect.stringMatching(/must stay wall-finish/) }]);
    const taken = await owner.post("/api/materials").send(wallFinish("POLISHED COPPER"));
    expect(taken.status).toBe(409);
    expect(taken.body.error.code).toBe("name_taken");
  });
});

describe("seed entries", () => {
  it("are read-only for every organization", async () => {
    const owner = await t.signInAs("owner");
    const change = wallFinish("Gold, polished or plated", 0.02, { changeNote: "ours" });
    for (const res of [
      await owner.post("/api/materials/seed-wall-gold/versions").send(change),
      await owner.put("/api/materials/seed-wall-gold/versions/1").send(change),
      await owner.post("/api/materials/seed-wall-gold/approval").send({ decision: "approve" }),
      await owner.post("/api/materials/seed-wall-gold/retire").send({}),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe("seed_read_only");
    }
  });

  it("can be copied into the organization as a new draft to adjust", async () => {
    const engineer = await t.signInAs("engineer");
    const copy = MaterialDetailSchema.parse((await engineer.post("/api/materials/seed-wall-gold/copy").send({})).body);
    const seed = MaterialDetailSchema.parse((await engineer.get("/api/materials/seed-wall-gold")).body);
    expect(copy).toMatchObject({ name: "Gold, polished or plated (copy)", scope: "organization", status: "draft", copiedFrom: { materialId: "seed-wall-gold", version: 1 } });
    expect(copy.shown.properties).toEqual(seed.shown.properties);
    expect(copy.shown.source).toEqual(seed.shown.source);
    expect((await engineer.post("/api/materials/seed-wall-gold/copy").send({})).body.name).toBe("Gold, polished or plated (copy 2)");
    expect((await engineer.post("/api/materials/seed-wall-gold/copy").send({ name: "Our gold plating" })).body.name).toBe("Our gold plating");
    expect(await auditActions()).toEqual(["material.copy", "material.copy", "material.copy"]);
  });
});

describe("a second organization", () => {
  it("sees the seed but none of the first one's entries, and cannot touch them", async () => {
    const owner = await t.signInAs("owner");
    const ours = await createApproved(owner, wallFinish("Kestrel wall (invented)"));
    const draft = await create(owner, wallFinish("Kestrel draft (invented)"));
    const other = (await t.signUpOtherOrganization()).agent;

    const list = MaterialListSchema.parse((await other.get("/api/materials")).body).materials;
    expect(list).toHaveLength(SEED_COUNT);
    expect(list.every((m) => m.scope === "seed")).toBe(true);
    expect((await other.get("/api/materials/export.csv")).text).not.toContain("Kestrel");
    for (const res of [
      await other.get(`/api/materials/${ours.id}`),
      await other.get(`/api/materials/${ours.id}/versions/1`),
      await other.post(`/api/materials/${ours.id}/versions`).send(wallFinish("Kestrel wall (invented)", 0.2, { changeNote: "x" })),
      await other.put(`/api/materials/${draft.id}/versions/1`).send(wallFinish("Kestrel draft (invented)")),
      await other.post(`/api/materials/${draft.id}/approval`).send({ decision: "approve" }),
      await other.post(`/api/materials/${ours.id}/retire`).send({}),
      await other.post(`/api/materials/${ours.id}/copy`).send({}),
    ]) {
      expect(res.status).toBe(404);
    }
    // Names are unique per organization, so the other lab may use the same one.
    await create(other, wallFinish("Kestrel wall (invented)"));
    expect(MaterialDetailSchema.parse((await owner.get(`/api/materials/${draft.id}`)).body).status).toBe("draft");
  });
});

describe("GET /api/materials filters", () => {
  it("filters by kind, status, scope and a search that treats % and _ as text", async () => {
    const viewer = await t.signInAs("viewer");
    const owner = await t.signInAs("owner");
    await create(owner, wallFinish("Wall 100% (invented)"));
    const names = async (query: string) => MaterialListSchema.parse((await viewer.get(`/api/materials${query}`)).body).materials.map((m) => m.name);
    expect((await names("?kind=cryogen")).length).toBe(Object.keys(CRYOGENS).length);
    expect(await names("?status=draft")).toEqual(["Wall 100% (invented)"]);
    expect(await names("?scope=organization")).toEqual(["Wall 100% (invented)"]);
    expect(await names("?q=0%25")).toEqual(["Wall 100% (invented)"]); // unescaped, "0%" would match every name with a 0 in it
    expect(await names("?q=_")).toEqual([]);
    expect(await names("?q=netting&kind=spacer")).toEqual(["Polyester netting", "Silk netting"]);
    const bad = await viewer.get("/api/materials?kind=foil");
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0]).toMatchObject({ path: "kind", message: expect.stringMatching(/reflector, spacer, wall-finish/) });
  });
});

describe("bad input", () => {
  it("names the field and the allowed range, and writes nothing", async () => {
    const engineer = await t.signInAs("engineer");
    const cases: [object, string, RegExp][] = [
      [wallFinish("Zero wall (invented)", 0), "properties.surface.model", /above 0 and at most 1 \(got 0\)/],
      [wallFinish("Hot wall (invented)", { kind: "table", points: [[77, 0.1], [300, 1.5]] }), "properties.surface.model.points.1.1", /at most 1 \(got 1.5\)/],
      [{ ...wallFinish("Range wall (invented)"), validRange_K: { min: 300, max: 4 } }, "validRange_K.max", /at or above validRange_K.min/],
      [{ ...wallFinish("Band wall (invented)", 0.1), properties: { kind: "wall-finish", surface: { model: 0.1, high: 0.05 } } }, "properties.surface.high", /must not be below the nominal/],
      [{ ...wallFinish("x") }, "name", /2 to 120 characters/],
      [{ ...wallFinish("Sourceless wall (invented)"), source: { type: "citation", title: "A book" } }, "source.author", /source.author is required/],
      [{ ...wallFinish("Rod (invented)"), properties: { kind: "support-material", supportMaterial: "ptfe" }, validRange_K: { min: 1, max: 300 } }, "validRange_K", /from 4 K \(the fit's lower limit\)/],
    ];
    for (const [body, field, message] of cases) {
      const res = await engineer.post("/api/materials").send(body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.fields, field).toContainEqual({ path: field, message: expect.stringMatching(message) });
    }
    expect(await countRows(t.ctx.db, "materials")).toBe(SEED_COUNT);
  });
});

describe("CSV import", () => {
  it("previews a valid file without writing, then imports every row as a draft in one go", async () => {
    const engineer = await t.signInAs("engineer");
    const preview = await upload(engineer, fixture("valid.csv"), "?dryRun=true");
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ valid: true, rowCount: 7 });
    expect(preview.body.rows.map((r: { line: number }) => r.line)).toEqual([2, 3, 4, 5, 6, 7, 8]);
    expect(await countRows(t.ctx.db, "materials")).toBe(SEED_COUNT);

    const res = await upload(engineer, fixture("valid.csv"));
    expect(res.status).toBe(201);
    expect(res.body.imported).toBe(7);
    const ours = MaterialListSchema.parse((await engineer.get("/api/materials?scope=organization")).body).materials;
    expect(ours.map((m) => m.kind).sort()).toEqual(["correlation-set", "cryogen", "reflector", "reflector", "spacer", "support-material", "wall-finish"]);
    expect(ours.every((m) => m.status === "draft" && m.shown.proposedBy === "Tomas Lindqvist")).toBe(true);
    const spacer = ours.find((m) => m.kind === "spacer")!;
    expect(spacer.shown.properties).toEqual({ kind: "spacer", form: "paper", solidConduction: { conductivity_W_per_m_K: 0.5, thickness_m: 0.0001, contactFactor: 0.01 } });
    expect(ours.find((m) => m.kind === "cryogen")!.shown.source.note).toBe("invented for tests,\nwith a note over two lines");
    expect((await auditActions()).filter((a) => a === "material.import")).toHaveLength(7);
  });

  const broken: { file: string; line: number; problem: RegExp; more?: [number, RegExp][] }[] = [
    { file: "missing-columns.csv", line: 1, problem: /missing columns valid_max_K, source_type/ },
    { file: "text-for-number.csv", line: 4, problem: /valid_min_K must be a number \(got "liquid nitrogen"\)/ },
    { file: "emissivity-zero.csv", line: 2, problem: /properties: surface\.model must be an emissivity above 0 and at most 1 \(got 0\)/ },
    { file: "emissivity-above-one.csv", line: 3, problem: /surface\.model\.points\[1\]\[1\] must be an emissivity above 0 and at most 1 \(got 1\.2\)/ },
    { file: "range-inverted.csv", line: 2, problem: /valid_max_K must be at or above valid_min_K \(got min 300 K, max 4 K\)/ },
    { file: "duplicate-names.csv", line: 4, problem: /already used on line 2 of this file/, more: [[5, /"polished copper" is already used by an entry in the library/]] },
    { file: "empty.csv", line: 1, problem: /the file is empty/ },
    { file: "header-only.csv", line: 1, problem: /a header but no entries/ },
    { file: "unknown-column.csv", line: 1, problem: /unknown column "emisivity"/ },
    { file: "ragged.csv", line: 3, problem: /different number of cells than the header/ },
    { file: "binary.csv", line: 1, problem: /not a text CSV file/ },
  ];
  for (const { file, line, problem, more = [] } of broken) {
    it(`${file}: 400 naming line ${line} and the problem; nothing written`, async () => {
      const engineer = await t.signInAs("engineer");
      const res = await upload(engineer, fixture(file));
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("invalid_csv");
      for (const [l, p] of [[line, problem], ...more] as [number, RegExp][]) {
        expect(res.body.error.message).toMatch(new RegExp(`line ${l}: [^;]*${p.source}`));
        expect(res.body.error.fields.some((f: { message: string }) => f.message.startsWith(`line ${l}: `) && p.test(f.message))).toBe(true);
      }
      expect(await countRows(t.ctx.db, "materials")).toBe(SEED_COUNT);
      expect(await countRows(t.ctx.db, "material_versions")).toBe(SEED_COUNT);
    });
  }

  it("a dry run of a file with bad rows lists each row's problems by line", async () => {
    const engineer = await t.signInAs("engineer");
    const res = await upload(engineer, fixture("emissivity-above-one.csv"), "?dryRun=true");
    expect(res.status).toBe(200);
    expect(res.body.valid).toBe(false);
    expect(res.body.rows).toEqual([
      { line: 2, kind: "wall-finish", name: "Test wall 1 (invented)", problems: [] },
      { line: 3, kind: "wall-finish", name: "Test wall 2 (invented)", problems: [{ column: "properties", message: expect.stringMatching(/got 1\.2/) }] },
    ]);
  });

  it("refuses a file over the size limit, a missing file and the wrong field", async () => {
    const engineer = await t.signInAs("engineer");
    const big = await upload(engineer, Buffer.alloc(MATERIAL_CSV_MAX_BYTES + 1, "a"));
    expect(big.status).toBe(413);
    expect(big.body.error.message).toMatch(/larger than the 1 MB limit/);
    const none = await engineer.post("/api/materials/import").send({});
    expect(none.status).toBe(400);
    expect(none.body.error.message).toMatch(/multipart field "file"/);
    const wrong = await engineer.post("/api/materials/import").attach("upload", fixture("valid.csv"), "valid.csv");
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.message).toMatch(/field "file" \(got "upload"\)/);
    expect(await countRows(t.ctx.db, "materials")).toBe(SEED_COUNT);
  });
});

describe("CSV export", () => {
  it("exports what the filters select, as text/csv", async () => {
    const viewer = await t.signInAs("viewer");
    const res = await viewer.get("/api/materials/export.csv?kind=cryogen");
    expect(res.headers["content-type"]).toMatch(/^text\/csv/);
    expect(res.headers["content-disposition"]).toMatch(/attachment; filename="frostfold-library-\d{4}-\d{2}-\d{2}\.csv"/);
    const lines = res.text.trim().split("\r\n");
    expect(lines[0]).toMatch(/^kind,name,valid_min_K,valid_max_K,properties,/);
    expect(lines).toHaveLength(1 + Object.keys(CRYOGENS).length);
    expect(lines.slice(1).every((l) => l.startsWith("cryogen,"))).toBe(true);
  });

  it("round-trips: what one organization exports another imports unchanged", async () => {
    const owner = await t.signInAs("owner");
    expect((await upload(owner, fixture("valid.csv"))).status).toBe(201);
    // A name a spreadsheet would run as a formula is written guarded and read back as it was.
    const guarded = await createApproved(owner, wallFinish("+5 K offset wall (invented)"));
    const exported = (await owner.get("/api/materials/export.csv?scope=organization")).text;
    expect(exported).toContain("'+5 K offset wall (invented)");

    const other = (await t.signUpOtherOrganization()).agent;
    const imported = await upload(other, Buffer.from(exported), "", "kestrel.csv");
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    expect(imported.body.imported).toBe(8);
    const reexported = (await other.get("/api/materials/export.csv?scope=organization")).text;
    // status, version and scope are for the reader; the data columns must match exactly.
    const data = (csv: string) => csv.replace(/,(draft|approved),\d+,organization\r\n/g, "\r\n");
    expect(data(reexported)).toBe(data(exported));

    const mine = MaterialListSchema.parse((await owner.get("/api/materials?scope=organization")).body).materials;
    const theirs = MaterialListSchema.parse((await other.get("/api/materials?scope=organization")).body).materials;
    const content = (m: (typeof mine)[number]) => ({ name: m.name, kind: m.kind, properties: m.shown.properties, range: m.shown.validRange_K, source: m.shown.source, t: m.shown.thickness_m, a: m.shown.arealMass_kg_per_m2, c: m.shown.cost_per_m2 });
    expect(theirs.map(content)).toEqual(mine.map(content));
    expect(theirs.map((m) => m.name)).toContain(guarded.name);
  });
});
