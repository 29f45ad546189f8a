import { describe, expect, it } from "vitest";
import { ROLES, type Role } from "../../shared/permissions";
import { AnalysisSchema, SeriesSchema, StoredFileSchema, TestDetailSchema, TestSummarySchema } from "../../shared/schemas/boil-off-test";
import { createDesign, createTest, sha256, storedState, uploadLog, WEIGHING_FIELDS, weighingLog } from "../support/boil-off";
import { countRows } from "../support/database";
import { useTestApp } from "../support/test-app";

const t = useTestApp();

// The smallest real PNG (1×1, one grey pixel) and a PDF header: attachments are sniffed by their first bytes.
const PNG = Buffer.from("89504e470d0a1a0a0000000d4948445200000001000000010802000000907753de0000000c4944415408d763f8ffff3f0005fe02fea7d6a4bb0000000049454e44ae426082", "hex");
const PDF = Buffer.from("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");

/** A nitrogen panel design (by the engineer) and a weighing test on it (by `as`). */
async function designAndTest(as: Role = "technician") {
  const engineer = await t.signInAs("engineer");
  const { design, predicted_W } = await createDesign(engineer);
  const agent = as === "engineer" ? engineer : await t.signInAs(as);
  const test = await createTest(agent, { designId: design.id, revision: 1, method: "weighing", vesselLabel: "Panel rig PR-1", notes: "first run" });
  return { agent, engineer, design, predicted_W, test };
}

/** A test with an uploaded log, so every read route has something to answer. */
async function analysedTest() {
  const setup = await designAndTest();
  const log = weighingLog({ rate_kg_per_s: -2e-5, readings: 300 });
  const res = await uploadLog(setup.agent, setup.test.id, log.csv, WEIGHING_FIELDS);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { ...setup, log, detail: TestDetailSchema.parse(res.body) };
}

describe("POST /api/boil-off-tests", () => {
  it("pins the test to the revision's cold stage and its prediction", async () => {
    const { test, design, predicted_W } = await designAndTest();
    expect(test).toMatchObject({
      designId: design.id,
      designName: "Test panel",
      revision: 1,
      stageIndex: 0,
      cryogen: "nitrogen",
      method: "weighing",
      vesselLabel: "Panel rig PR-1",
      status: "logging",
      notes: "first run",
      capacity_L: 100,
      log: null,
      analysis: null,
      attachments: [],
      createdBy: "Ada Reyes",
    });
    expect(test.predictedHeatLeak_W).toBeCloseTo(predicted_W, 12);
    const list = await (await t.signInAs("viewer")).get("/api/boil-off-tests");
    expect(list.status).toBe(200);
    expect(list.body.tests.map((x: unknown) => TestSummarySchema.parse(x).id)).toEqual([test.id]);
    const actions = (await t.ctx.db.query.auditLog.findMany()).map((e) => e.action);
    expect(actions).toContain("test.create");
  });

  it("keeps the vent flowmeter's reference conditions and a level test's capacity", async () => {
    const engineer = await t.signInAs("engineer");
    const { design } = await createDesign(engineer);
    const vent = await createTest(engineer, { designId: design.id, revision: 1, method: "vent-flow", vesselLabel: "V", ventReference: "standard-20C" });
    expect(vent.ventReference).toBe("standard-20C");
    const defaulted = await createTest(engineer, { designId: design.id, revision: 1, method: "vent-flow", vesselLabel: "V2" });
    expect(defaulted.ventReference).toBe("normal-0C");
    const level = await createTest(engineer, { designId: design.id, revision: 1, method: "level", vesselLabel: "L", capacity_L: 42, fullScale_mm: 500 });
    expect(level).toMatchObject({ capacity_L: 42, fullScale_mm: 500, ventReference: null });
  });

  it("names every bad field and stores nothing", async () => {
    const engineer = await t.signInAs("engineer");
    const { design } = await createDesign(engineer);
    const bad = await engineer.post("/api/boil-off-tests").send({ designId: design.id, revision: 0, method: "scale", ambientTemperature_K: 20 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(["ambientTemperature_K", "method", "revision", "vesselLabel"]);
    expect(bad.body.error.fields.find((f: { path: string }) => f.path === "method").message).toBe("method must be one of weighing, vent-flow, level");

    const stage = await engineer.post("/api/boil-off-tests").send({ designId: design.id, revision: 1, method: "weighing", vesselLabel: "X", stageIndex: 3 });
    expect(stage.status).toBe(400);
    expect(stage.body.error.fields[0]).toEqual({ path: "stageIndex", message: expect.stringMatching(/^stageIndex must be from 0 to 0 for this revision/) });

    const noRevision = await engineer.post("/api/boil-off-tests").send({ designId: design.id, revision: 2, method: "weighing", vesselLabel: "X" });
    expect(noRevision.status).toBe(404);
    expect(await countRows(t.ctx.db, "boil_off_tests")).toBe(0);
  });
});

describe("roles", () => {
  // create/upload: technicians, engineers (and owners); read: everyone; delete: owners only.
  const writes: Record<Role, boolean> = { owner: true, engineer: true, technician: true, viewer: false };

  for (const role of ROLES) {
    it(`${role}: reads every test route${writes[role] ? ", creates, previews and uploads logs, moves the window, notes, attaches and accepts" : " and changes nothing"}${role === "owner" ? ", and deletes" : ""}`, async () => {
      const { detail, design } = await analysedTest();
      const agent = await t.signInAs(role);
      const id = detail.id;
      expect((await agent.get("/api/boil-off-tests")).body.tests).toHaveLength(1);
      expect(TestDetailSchema.parse((await agent.get(`/api/boil-off-tests/${id}`)).body).id).toBe(id);
      expect(AnalysisSchema.parse((await agent.get(`/api/boil-off-tests/${id}/analysis`)).body).points).toBeGreaterThanOrEqual(10);
      expect(SeriesSchema.parse((await agent.get(`/api/boil-off-tests/${id}/series`)).body).totalPoints).toBe(300);
      const before = await storedState(t);

      const create = await agent.post("/api/boil-off-tests").send({ designId: design.id, revision: 1, method: "weighing", vesselLabel: `by ${role}` });
      const csv = weighingLog({ rate_kg_per_s: -3e-5, readings: 200, seed: 2 }).csv;
      const preview = await agent.post(`/api/boil-off-tests/${id}/logs/preview`).attach("file", Buffer.from(csv), "log.csv");
      const upload = await uploadLog(agent, id, csv, WEIGHING_FIELDS);
      const suggested = await agent.delete(`/api/boil-off-tests/${id}/window`);
      const window = await agent.put(`/api/boil-off-tests/${id}/window`).send({ start_s: 600, end_s: 9000 });
      const notes = await agent.patch(`/api/boil-off-tests/${id}`).send({ notes: `note by ${role}` });
      const attach = await agent.post(`/api/boil-off-tests/${id}/attachments`).attach("file", PNG, { filename: "plate.png", contentType: "image/png" });
      const accept = await agent.post(`/api/boil-off-tests/${id}/accept`);
      if (writes[role]) {
        expect([create.status, preview.status, upload.status, suggested.status, window.status, notes.status, attach.status, accept.status]).toEqual([201, 200, 201, 200, 200, 200, 201, 200]);
        expect(accept.body.status).toBe("accepted");
        expect(await countRows(t.ctx.db, "boil_off_tests")).toBe(2);
      } else {
        expect([create.status, preview.status, upload.status, suggested.status, window.status, notes.status, attach.status, accept.status]).toEqual(Array(8).fill(403));
        expect(await storedState(t)).toEqual(before);
        expect(await countRows(t.ctx.db, "boil_off_tests")).toBe(1);
      }

      const del = await agent.delete(`/api/boil-off-tests/${id}`);
      if (role === "owner") {
        expect(del.status).toBe(204);
        expect((await agent.get(`/api/boil-off-tests/${id}`)).status).toBe(404);
        expect(await countRows(t.ctx.db, "boil_off_test_files")).toBe(0);
        // The log, its parsed series and the attachment went with it.
        expect((await t.ctx.objects.list()).filter((k) => k.includes(`/tests/${id}/`))).toEqual([]);
        expect((await t.ctx.db.query.auditLog.findMany()).map((e) => e.action)).toContain("test.delete");
      } else {
        expect(del.status).toBe(403);
        expect((await agent.get(`/api/boil-off-tests/${id}`)).status).toBe(200);
      }
    });
  }

  it("without a session every test route gives 401", async () => {
    const { detail } = await analysedTest();
    const anon = t.agent();
    const id = detail.id;
    const answers = await Promise.all([
      anon.get("/api/boil-off-tests"),
      anon.post("/api/boil-off-tests").send({}),
      anon.get(`/api/boil-off-tests/${id}`),
      anon.post(`/api/boil-off-tests/${id}/logs`).attach("file", Buffer.from("a,b\n1,2\n"), "x.csv"),
      anon.put(`/api/boil-off-tests/${id}/window`).send({ start_s: 0, end_s: 100 }),
      anon.get(`/api/boil-off-tests/${id}/analysis`),
      anon.get(`/api/boil-off-tests/${id}/series`),
      anon.post(`/api/boil-off-tests/${id}/accept`),
      anon.post(`/api/boil-off-tests/${id}/attachments`).attach("file", PNG, "p.png"),
      anon.delete(`/api/boil-off-tests/${id}`),
      anon.get("/api/alerts"),
      anon.get("/api/settings/alerts"),
    ]);
    expect(answers.map((r) => r.status)).toEqual(Array(answers.length).fill(401));
  });
});

describe("a second organization", () => {
  it("sees none of the first one's tests, files or alerts, and cannot reach them by id", async () => {
    const { detail, design } = await analysedTest();
    const attached = await (await t.signInAs("technician")).post(`/api/boil-off-tests/${detail.id}/attachments`).attach("file", PDF, "sheet.pdf");
    expect(attached.status).toBe(201);
    const { agent: other } = await t.signUpOtherOrganization();
    const before = await storedState(t);
    const id = detail.id;
    expect((await other.get("/api/boil-off-tests")).body.tests).toEqual([]);
    expect((await other.get("/api/alerts")).body.alerts).toEqual([]);
    const answers = await Promise.all([
      other.get(`/api/boil-off-tests/${id}`),
      other.get(`/api/boil-off-tests/${id}/analysis`),
      other.get(`/api/boil-off-tests/${id}/series`),
      other.get(`/api/boil-off-tests/${id}/attachments/${attached.body.id}`),
      other.put(`/api/boil-off-tests/${id}/window`).send({ start_s: 0, end_s: 5000 }),
      other.delete(`/api/boil-off-tests/${id}/window`),
      other.post(`/api/boil-off-tests/${id}/logs/preview`).attach("file", Buffer.from("a,b\n1,2\n"), "x.csv"),
      other.patch(`/api/boil-off-tests/${id}`).send({ notes: "mine now" }),
      other.post(`/api/boil-off-tests/${id}/accept`),
      other.delete(`/api/boil-off-tests/${id}`),
      uploadLog(other, id, weighingLog({ rate_kg_per_s: -1e-5, readings: 50 }).csv, WEIGHING_FIELDS),
      other.post(`/api/boil-off-tests/${id}/attachments`).attach("file", PNG, "p.png"),
      // Nor can it hang a test on the first organization's design.
      other.post("/api/boil-off-tests").send({ designId: design.id, revision: 1, method: "weighing", vesselLabel: "borrowed" }),
      other.get(`/api/designs/${design.id}/calibration`),
    ]);
    expect(answers.map((r) => r.status)).toEqual(Array(answers.length).fill(404));
    expect(await storedState(t)).toEqual(before);
    expect(await countRows(t.ctx.db, "boil_off_tests")).toBe(1);
  });
});

describe("GET /api/boil-off-tests", () => {
  it("filters by design and status, newest reading first", async () => {
    const { design, detail, agent } = await analysedTest();
    const engineer = await t.signInAs("engineer");
    const other = await createDesign(engineer, "Second panel");
    const second = await createTest(agent, { designId: other.design.id, revision: 1, method: "level", vesselLabel: "L-2" });
    const all = (await agent.get("/api/boil-off-tests")).body.tests as { id: string }[];
    expect(all.map((x) => x.id).sort()).toEqual([detail.id, second.id].sort());
    expect((await agent.get(`/api/boil-off-tests?designId=${design.id}`)).body.tests.map((x: { id: string }) => x.id)).toEqual([detail.id]);
    expect((await agent.get("/api/boil-off-tests?status=logging")).body.tests.map((x: { id: string }) => x.id)).toEqual([second.id]);
    const analysed = (await agent.get("/api/boil-off-tests?status=analysed")).body.tests;
    expect(analysed).toHaveLength(1);
    expect(analysed[0]).toMatchObject({ id: detail.id, designName: "Test panel", method: "weighing", status: "analysed", testedAt: "2026-11-02T08:00:00.000Z" });
    expect(analysed[0].ratio).toBeCloseTo(analysed[0].measuredHeatLeak_W / analysed[0].predictedHeatLeak_W, 12);
    const bad = await agent.get("/api/boil-off-tests?status=done");
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe("status");
  });
});

describe("notes, attachments and accepting", () => {
  it("keeps attachments in the object store with their checksum, and serves them back byte for byte", async () => {
    const { detail, agent } = await analysedTest();
    const res = await agent.post(`/api/boil-off-tests/${detail.id}/attachments`).attach("file", PDF, { filename: "../../calibration sheet.pdf", contentType: "text/plain" });
    expect(res.status).toBe(201);
    const file = StoredFileSchema.parse(res.body);
    // The type comes from the bytes, the name loses its path.
    expect(file).toMatchObject({ filename: "calibration sheet.pdf", contentType: "application/pdf", size_bytes: PDF.length, sha256: sha256(PDF), uploadedBy: "Ada Reyes" });
    const row = (await t.ctx.db.query.boilOffTestFiles.findMany()).find((f) => f.id === file.id)!;
    expect(sha256(await t.ctx.objects.getBuffer(row.objectKey))).toBe(sha256(PDF));
    const back = await (await t.signInAs("viewer")).get(`/api/boil-off-tests/${detail.id}/attachments/${file.id}`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => cb(null, Buffer.concat(chunks)));
    });
    expect(back.status).toBe(200);
    expect(back.headers["content-type"]).toBe("application/pdf");
    expect(back.headers["content-disposition"]).toContain("calibration sheet.pdf");
    expect(Buffer.compare(back.body as Buffer, PDF)).toBe(0);
    expect(TestDetailSchema.parse((await agent.get(`/api/boil-off-tests/${detail.id}`)).body).attachments.map((a) => a.id)).toEqual([file.id]);
  });

  it("refuses an attachment that is not an image or PDF, or empty, and stores nothing", async () => {
    const { detail, agent } = await analysedTest();
    const before = await storedState(t);
    const text = await agent.post(`/api/boil-off-tests/${detail.id}/attachments`).attach("file", Buffer.from("just some text"), { filename: "photo.png", contentType: "image/png" });
    expect(text.status).toBe(415);
    expect(text.body.error.fields[0].path).toBe("file");
    const empty = await agent.post(`/api/boil-off-tests/${detail.id}/attachments`).attach("file", Buffer.alloc(0), "empty.pdf");
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields[0].path).toBe("file");
    const none = await agent.post(`/api/boil-off-tests/${detail.id}/attachments`).field("note", "no file");
    expect(none.status).toBe(400);
    expect(none.body.error.fields[0]).toEqual({ path: "file", message: "a file is required" });
    expect(await storedState(t)).toEqual(before);
  });

  it("updates notes, and refuses to accept a test without an analysis or twice", async () => {
    const { test, agent } = await designAndTest();
    const notes = await agent.patch(`/api/boil-off-tests/${test.id}`).send({ notes: "  scale recalibrated  " });
    expect(notes.status).toBe(200);
    expect(notes.body.notes).toBe("scale recalibrated");
    const early = await agent.post(`/api/boil-off-tests/${test.id}/accept`);
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe("no_analysis");
    expect((await agent.get(`/api/boil-off-tests/${test.id}/analysis`)).status).toBe(409);
    expect((await agent.get(`/api/boil-off-tests/${test.id}/series`)).status).toBe(409);
    expect((await agent.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: 0, end_s: 100 })).body.error.code).toBe("no_log");

    expect((await uploadLog(agent, test.id, weighingLog({ rate_kg_per_s: -2e-5, readings: 100 }).csv, WEIGHING_FIELDS)).status).toBe(201);
    const accepted = await (await t.signInAs("engineer")).post(`/api/boil-off-tests/${test.id}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ status: "accepted", acceptedBy: "Tomas Lindqvist" });
    expect((await agent.post(`/api/boil-off-tests/${test.id}/accept`)).body.error.code).toBe("already_accepted");
  });

  it("freezes an accepted test's log and window", async () => {
    const { detail, agent } = await analysedTest();
    expect((await agent.post(`/api/boil-off-tests/${detail.id}/accept`)).status).toBe(200);
    const before = await storedState(t);
    const upload = await uploadLog(agent, detail.id, weighingLog({ rate_kg_per_s: -1e-5, readings: 100 }).csv, WEIGHING_FIELDS);
    expect(upload.status).toBe(409);
    expect(upload.body.error.code).toBe("test_accepted");
    const window = await agent.put(`/api/boil-off-tests/${detail.id}/window`).send({ start_s: 0, end_s: 6000 });
    expect(window.status).toBe(409);
    expect((await agent.delete(`/api/boil-off-tests/${detail.id}/window`)).status).toBe(409);
    expect(await storedState(t)).toEqual(before);
  });
});
