import { describe, expect, it } from "vitest";
import { ROLES, type Role } from "../../shared/permissions";
import { AlertSchema, DEFAULT_ALERT_THRESHOLD } from "../../shared/schemas/alert";
import { CalibrationSchema } from "../../shared/schemas/boil-off-test";
import { createDesign, createTest, panelContent, uploadLog, WEIGHING_FIELDS, weighingLog, type Agent } from "../support/boil-off";
import { countRows } from "../support/database";
import { linkIn, tokenOf, useTestApp } from "../support/test-app";

/**
 * Alerts (an accepted test over the organization's threshold mails the design's engineers and
 * the owners, and stays open until acknowledged), the threshold setting, and calibration from
 * accepted tests.
 */
const t = useTestApp();

// Saturated nitrogen at 1 atm, NIST Chemistry WebBook (Span et al. 2000), as shared/thermal/fluids.ts carries it.
const slopeFor = (heat_W: number) => -(heat_W * (1 - 4.6079 / 806.08)) / 199_180;

/** An invitee who follows the mailed link, with a session. */
async function invite(role: Role, email: string): Promise<Agent> {
  const owner = await t.signInAs("owner");
  expect((await owner.post("/api/team/invitations").send({ email, role })).status).toBe(201);
  const mail = await t.smtp.waitFor((m) => m.to.includes(email));
  const agent = t.agent();
  const res = await agent.post("/api/invitations/accept").send({ token: tokenOf(linkIn(mail.text, "/invitations/accept?token=")), name: `Second ${role}`, password: "second-member-password" });
  expect(res.status).toBe(200);
  return agent;
}

/**
 * A nitrogen panel designed by the demo engineer, and a weighing test on it (by the technician)
 * whose log leaks `ratio` × the prediction: 600 readings a minute apart, 1 g noise.
 */
async function analysedTest(ratio: number, options: { designId?: string; revision?: number; seed?: number; vesselLabel?: string } = {}) {
  const engineer = await t.signInAs("engineer");
  const made = options.designId ? null : await createDesign(engineer, "Alert panel");
  const designId = options.designId ?? made!.design.id;
  const revision = options.revision ?? 1;
  const technician = await t.signInAs("technician");
  const test = await createTest(technician, { designId, revision, method: "weighing", vesselLabel: options.vesselLabel ?? "Panel rig PR-1" });
  const log = weighingLog({ rate_kg_per_s: slopeFor(ratio * test.predictedHeatLeak_W!), readings: 600, noise_kg: 0.001, seed: options.seed ?? 5 });
  const up = await uploadLog(technician, test.id, log.csv, WEIGHING_FIELDS);
  expect(up.status, JSON.stringify(up.body)).toBe(201);
  // Fit the whole (steady) log.
  expect((await technician.put(`/api/boil-off-tests/${test.id}/window`).send({ start_s: 0, end_s: 599 * 60 })).status).toBe(200);
  return { engineer, technician, designId, test };
}

async function settle() {
  await t.ctx.outbox.flush();
  return t.smtp.messages.filter((m) => m.subject.startsWith("Boil-off test over its prediction"));
}

describe("alerts", () => {
  it("an owner who opted out of alert e-mails gets none; the design's engineer still does", async () => {
    const owner = await t.signInAs("owner");
    const off = await owner.patch("/api/auth/me/preferences").send({ alertEmails: false });
    expect(off.status).toBe(200);
    expect(off.body.user.alertEmails).toBe(false);
    expect(off.body.user.unitSystem).toBe("si"); // the other preference is left as it was
    const bad = await owner.patch("/api/auth/me/preferences").send({ alertEmails: "no" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.map((f: { path: string }) => f.path)).toEqual(["alertEmails"]);
    const empty = await owner.patch("/api/auth/me/preferences").send({});
    expect(empty.status).toBe(400);
    expect((await owner.get("/api/auth/me")).body.user.alertEmails).toBe(false);

    t.smtp.clear();
    const { technician, test } = await analysedTest(1.4);
    expect((await technician.post(`/api/boil-off-tests/${test.id}/accept`)).status).toBe(200);
    const mails = await settle();
    expect(mails.map((m) => m.to).flat()).toEqual(["engineer@kestrelbay.example"]);
    // The alert itself is raised as before and shows on Overview for everyone.
    expect((await owner.get("/api/alerts")).body.alerts).toHaveLength(1);
  });

  it("an accepted test over the threshold mails the owners and the design's engineers, and shows until acknowledged", async () => {
    const bystander = await invite("engineer", "bystander.engineer@kestrelbay.example");
    const other = await t.signUpOtherOrganization();
    t.smtp.clear();
    const { technician, test } = await analysedTest(1.4);
    expect(await settle()).toEqual([]); // analysed is not accepted: no alert yet
    expect((await technician.get("/api/alerts")).body.alerts).toEqual([]);

    const accepted = await technician.post(`/api/boil-off-tests/${test.id}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body.ratio).toBeGreaterThan(1.35);
    expect(accepted.body.ratio).toBeLessThan(1.45);

    const mails = await settle();
    // The owner and the engineer who made the design; not the technician, the viewer, an engineer
    // who never touched this design, or anyone in the other organization.
    expect(mails.map((m) => m.to).flat().sort()).toEqual(["engineer@kestrelbay.example", "owner@kestrelbay.example"]);
    const mail = mails[0];
    expect(mail.subject).toMatch(/^Boil-off test over its prediction: Panel rig PR-1 at 1\.[34]\d×$/);
    expect(mail.text).toContain("Alert panel, revision 1");
    expect(mail.text).toContain("above the alert threshold of 1.25×");
    expect(linkIn(mail.text, `/tests/${test.id}`)).toBe(`http://frostfold.test/tests/${test.id}`);
    const outbox = await t.ctx.db.query.emailOutbox.findMany();
    expect(outbox.filter((r) => r.subject.startsWith("Boil-off")).map((r) => r.toAddress).sort()).toEqual(["engineer@kestrelbay.example", "owner@kestrelbay.example"]);

    // Every member of the organization sees it open; the other organization sees nothing.
    for (const role of ROLES) {
      const list = (await (await t.signInAs(role)).get("/api/alerts")).body.alerts;
      expect(list).toHaveLength(1);
      expect(AlertSchema.parse(list[0])).toMatchObject({ testId: test.id, designName: "Alert panel", revision: 1, vesselLabel: "Panel rig PR-1", threshold: 1.25, acknowledgedAt: null, acknowledgedBy: null });
      expect(list[0].ratio).toBe(accepted.body.ratio);
    }
    expect((await bystander.get("/api/alerts")).body.alerts).toHaveLength(1);
    expect((await other.agent.get("/api/alerts")).body.alerts).toEqual([]);
    const alertId = (await technician.get("/api/alerts")).body.alerts[0].id as string;

    // Technicians and viewers may not acknowledge; another organization cannot even find it.
    expect((await technician.post(`/api/alerts/${alertId}/acknowledge`)).status).toBe(403);
    expect((await (await t.signInAs("viewer")).post(`/api/alerts/${alertId}/acknowledge`)).status).toBe(403);
    expect((await other.agent.post(`/api/alerts/${alertId}/acknowledge`)).status).toBe(404);
    expect((await technician.get("/api/alerts")).body.alerts).toHaveLength(1);

    const engineer = await t.signInAs("engineer");
    const ack = await engineer.post(`/api/alerts/${alertId}/acknowledge`);
    expect(ack.status).toBe(200);
    expect(AlertSchema.parse(ack.body)).toMatchObject({ id: alertId, acknowledgedBy: "Tomas Lindqvist" });
    expect(ack.body.acknowledgedAt).not.toBeNull();
    expect((await technician.get("/api/alerts")).body.alerts).toEqual([]);
    const again = await (await t.signInAs("owner")).post(`/api/alerts/${alertId}/acknowledge`);
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: "already_acknowledged", message: "This alert was already acknowledged by Tomas Lindqvist." });
    expect((await engineer.post("/api/alerts/no-such-alert/acknowledge")).status).toBe(404);
    const actions = (await t.ctx.db.query.auditLog.findMany()).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(["test.accept", "alert.raise", "alert.acknowledge"]));
  });

  it("an engineer who saved a later revision of the design is one of its engineers", async () => {
    const second = await invite("engineer", "second.engineer@kestrelbay.example");
    const { designId, technician, test } = await analysedTest(1.5);
    const revise = await second.post(`/api/designs/${designId}/revisions`).send({ baseRevision: 1, content: await panelContent(second, { layers: 12 }), changeNote: "Two more layers" });
    expect(revise.status).toBe(201);
    t.smtp.clear();
    expect((await technician.post(`/api/boil-off-tests/${test.id}/accept`)).status).toBe(200);
    expect((await settle()).map((m) => m.to).flat().sort()).toEqual(["engineer@kestrelbay.example", "owner@kestrelbay.example", "second.engineer@kestrelbay.example"]);
  });

  it("a test within the threshold raises nothing, and the threshold is the organization's own", async () => {
    const { technician, test, designId } = await analysedTest(1.1);
    t.smtp.clear();
    expect((await technician.post(`/api/boil-off-tests/${test.id}/accept`)).status).toBe(200);
    expect(await settle()).toEqual([]);
    expect(await countRows(t.ctx.db, "alerts")).toBe(0);

    // Raised to 1.6, a test 40 % over raises nothing either; lowered to 1.05, a test 10 % over does.
    const owner = await t.signInAs("owner");
    expect((await owner.put("/api/settings/alerts").send({ threshold: 1.6 })).body).toEqual({ threshold: 1.6 });
    const high = await analysedTest(1.4, { designId, vesselLabel: "Rig 2", seed: 9 });
    expect((await high.technician.post(`/api/boil-off-tests/${high.test.id}/accept`)).status).toBe(200);
    expect(await settle()).toEqual([]);
    expect((await owner.put("/api/settings/alerts").send({ threshold: 1.05 })).status).toBe(200);
    const low = await analysedTest(1.1, { designId, vesselLabel: "Rig 3", seed: 10 });
    expect((await low.technician.post(`/api/boil-off-tests/${low.test.id}/accept`)).status).toBe(200);
    const mails = await settle();
    expect(mails).toHaveLength(2);
    expect(mails[0].text).toContain("above the alert threshold of 1.05×");
    const alerts = (await owner.get("/api/alerts")).body.alerts;
    expect(alerts.map((a: { testId: string; threshold: number }) => [a.testId, a.threshold])).toEqual([[low.test.id, 1.05]]);
  });
});

describe("GET and PUT /api/settings/alerts", () => {
  it("every member reads the threshold (1.25 by default); only owners change it, within its range", async () => {
    expect(DEFAULT_ALERT_THRESHOLD).toBe(1.25);
    for (const role of ROLES) {
      const agent = await t.signInAs(role);
      expect((await agent.get("/api/settings/alerts")).body).toEqual({ threshold: 1.25 });
      if (role !== "owner") expect((await agent.put("/api/settings/alerts").send({ threshold: 1.5 })).status).toBe(403);
    }
    const owner = await t.signInAs("owner");
    for (const bad of [0.9, 11, "1.5", null]) {
      const res = await owner.put("/api/settings/alerts").send({ threshold: bad });
      expect(res.status).toBe(400);
      expect(res.body.error.fields[0]).toEqual({ path: "threshold", message: expect.stringMatching(/^threshold must be (a number )?from 1 to 10 \(measured over predicted\)$/) });
    }
    expect((await owner.put("/api/settings/alerts").send({ threshold: 1.3333 })).body).toEqual({ threshold: 1.333 });
    expect((await (await t.signInAs("viewer")).get("/api/settings/alerts")).body).toEqual({ threshold: 1.333 });
    // Another organization keeps its own default.
    const other = await t.signUpOtherOrganization();
    expect((await other.agent.get("/api/settings/alerts")).body).toEqual({ threshold: 1.25 });
    expect((await t.ctx.db.query.auditLog.findMany()).map((e) => e.action)).toContain("settings.alert_threshold");
  });
});

describe("calibration", () => {
  it("pools the accepted tests' ratios by inverse variance and saves the factor as a new revision", async () => {
    const first = await analysedTest(1.3, { seed: 21 });
    const engineer = first.engineer;
    const empty = CalibrationSchema.parse((await engineer.get(`/api/designs/${first.designId}/calibration`)).body);
    expect(empty).toMatchObject({ designId: first.designId, latestRevision: 1, tests: [], factor: null, factorStdError: null });
    const none = await engineer.post(`/api/designs/${first.designId}/calibration/apply`).send({ baseRevision: 1 });
    expect(none.status).toBe(409);
    expect(none.body.error.code).toBe("no_accepted_tests");

    expect((await first.technician.post(`/api/boil-off-tests/${first.test.id}/accept`)).status).toBe(200);
    const second = await analysedTest(1.5, { designId: first.designId, seed: 22, vesselLabel: "Rig 2" });
    expect((await second.technician.post(`/api/boil-off-tests/${second.test.id}/accept`)).status).toBe(200);
    // Analysed but not accepted: not evidence.
    await analysedTest(3, { designId: first.designId, seed: 23, vesselLabel: "Rig 3" });

    const viewer = await t.signInAs("viewer");
    const cal = CalibrationSchema.parse((await viewer.get(`/api/designs/${first.designId}/calibration`)).body);
    expect(cal.tests.map((x) => x.id)).toEqual([first.test.id, second.test.id]);
    // By hand: x̄ = Σ(xᵢ/σᵢ²)/Σ(1/σᵢ²), SE = 1/√Σ(1/σᵢ²) (Taylor, An Introduction to Error Analysis, §7.2).
    const w = cal.tests.map((x) => 1 / x.ratioStdError ** 2);
    const hand = cal.tests.reduce((s, x, i) => s + w[i] * x.ratio, 0) / (w[0] + w[1]);
    expect(cal.factor!).toBeCloseTo(hand, 12);
    expect(cal.factorStdError!).toBeCloseTo(1 / Math.sqrt(w[0] + w[1]), 12);
    expect(cal.factor!).toBeGreaterThan(1.25);
    expect(cal.factor!).toBeLessThan(1.55);

    // Technicians and viewers may not save it; a stale base is refused; the engineer saves revision 2.
    expect((await viewer.post(`/api/designs/${first.designId}/calibration/apply`).send({ baseRevision: 1 })).status).toBe(403);
    expect((await first.technician.post(`/api/designs/${first.designId}/calibration/apply`).send({ baseRevision: 1 })).status).toBe(403);
    const bad = await engineer.post(`/api/designs/${first.designId}/calibration/apply`).send({ baseRevision: 0 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe("baseRevision");
    const applied = await engineer.post(`/api/designs/${first.designId}/calibration/apply`).send({ baseRevision: 1 });
    expect(applied.status).toBe(201);
    expect(applied.body.revision).toBe(2);
    expect(applied.body.changeNote).toBe("Calibrated from 2 accepted tests");
    expect(applied.body.calibration).toMatchObject({ tests: 2, clampedBlocks: [] });
    expect(applied.body.calibration.factor).toBeCloseTo(cal.factor!, 12);
    // The block's degradation factor (1 by default) becomes the factor, to three decimals,
    // and the new prediction rises by about as much.
    expect(applied.body.content.layup[0].degradationFactor).toBeCloseTo(cal.factor!, 3);
    const rev1 = (await engineer.get(`/api/designs/${first.designId}/revisions/1`)).body;
    expect(applied.body.prediction.coldHeat_W / rev1.prediction.coldHeat_W).toBeGreaterThan(1.2);
    const stale = await engineer.post(`/api/designs/${first.designId}/calibration/apply`).send({ baseRevision: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("stale_revision");
    expect(await countRows(t.ctx.db, "design_revisions")).toBe(2);
    // The tests stay pinned to the revision they ran on.
    expect((await viewer.get(`/api/boil-off-tests/${first.test.id}`)).body.revision).toBe(1);
    expect((await (await t.signUpOtherOrganization()).agent.post(`/api/designs/${first.designId}/calibration/apply`).send({ baseRevision: 2 })).status).toBe(404);
  });
});
