import { describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "../../server/db/seed/demo";
import type { Role } from "../../shared/permissions";
import type { DesignContentInput, MaterialRef } from "../../shared/schemas/design";
import { MaterialDetailSchema, type MaterialDetail } from "../../shared/schemas/material";
import { TeamSchema } from "../../shared/schemas/team";
import { countRows } from "../support/database";
import { panelContent } from "../support/designs";
import { linkIn, tokenOf, useTestApp, type TestApp } from "../support/test-app";

// The live preview's caches (server/cache): every test fills them with a first request, changes
// something, and shows that the very next request already sees the change.

type Agent = ReturnType<TestApp["agent"]>;
const t = useTestApp();

/** A flat panel between a 300 K wall and liquid nitrogen, with one radiation block. */
const panel = async (): Promise<DesignContentInput> => panelContent(await t.signInAs("viewer"));
const withWarmFinish = (content: DesignContentInput, finish: MaterialRef): DesignContentInput => ({ ...content, warm: { ...content.warm, finish } });

const estimate = (agent: Agent, content: DesignContentInput) => agent.post("/api/estimate").send({ content });
const sweep = (agent: Agent, content: DesignContentInput) => agent.post("/api/estimate/sweep").send({ content, variable: "warm-temperature" });
/** The same estimate sent with nothing but the given session cookie. */
const estimateWithCookie = (cookie: string, content: DesignContentInput) => t.agent().post("/api/estimate").set("Cookie", cookie).send({ content });

/** The heat reaching the cold wall, from an estimate that must succeed. */
async function heatOf(agent: Agent, content: DesignContentInput): Promise<number> {
  const res = await estimate(agent, content);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body.prediction.coldHeat_W as number;
}

/** The field paths of an answer that must be a 400. */
function refusedPaths(res: { status: number; body: { error?: { fields?: { path: string }[] } } }): string[] {
  expect(res.status, JSON.stringify(res.body)).toBe(400);
  return (res.body.error?.fields ?? []).map((f) => f.path);
}

/** Signs in as the demo user with the role and returns the agent with its session cookie ("name=value"). */
async function signIn(role: Role): Promise<{ agent: Agent; cookie: string }> {
  const agent = t.agent();
  const user = DEMO_USERS.find((u) => u.role === role)!;
  const res = await agent.post("/api/auth/sign-in").send({ email: user.email, password: DEMO_PASSWORD });
  expect(res.status).toBe(200);
  const cookie = String(res.headers["set-cookie"]).match(/frostfold_session=[^;]+/)?.[0];
  expect(cookie).toBeDefined();
  return { agent, cookie: cookie! };
}

async function memberId(owner: Agent, email: string): Promise<string> {
  const team = TeamSchema.parse((await owner.get("/api/team/members")).body);
  return team.members.find((m) => m.email === email)!.id;
}

// Invented numbers for the tests: they describe no real surface.
const wallFinish = (name: string, emissivity: number, extra: Record<string, unknown> = {}) => ({
  name,
  properties: { kind: "wall-finish", surface: { model: emissivity } },
  validRange_K: { min: 77, max: 300 },
  source: { type: "memory", note: "invented for tests" },
  ...extra,
});

/** An organization wall finish whose version 1 the owner has approved. */
async function approvedWallFinish(owner: Agent, name: string, emissivity: number): Promise<MaterialDetail> {
  const draft = await owner.post("/api/materials").send(wallFinish(name, emissivity));
  expect(draft.status, JSON.stringify(draft.body)).toBe(201);
  const approved = await owner.post(`/api/materials/${draft.body.id}/approval`).send({ decision: "approve" });
  expect(approved.status).toBe(200);
  return MaterialDetailSchema.parse(approved.body);
}

describe("the auth cache", () => {
  it("a demoted engineer is refused the next design change in every session at once, keeps reading, and may change designs again once promoted", async () => {
    const content = await panel();
    const [laptop, tablet] = [await t.signInAs("engineer"), await t.signInAs("engineer")];
    for (const session of [laptop, tablet]) expect((await estimate(session, content)).status).toBe(200);

    const owner = await t.signInAs("owner");
    const engineerId = await memberId(owner, "engineer@kestrelbay.example");
    expect((await owner.patch(`/api/team/members/${engineerId}`).send({ role: "viewer" })).status).toBe(200);
    for (const session of [laptop, tablet]) {
      const refused = await session.post("/api/designs").send({ name: "After demotion", content });
      expect(refused.status).toBe(403);
      expect(refused.body.error.message).toMatch(/\(viewer\)/);
    }
    expect((await laptop.get("/api/designs")).status).toBe(200);
    expect((await estimate(laptop, content)).status).toBe(200);
    expect(await countRows(t.ctx.db, "designs")).toBe(0);

    expect((await owner.patch(`/api/team/members/${engineerId}`).send({ role: "engineer" })).status).toBe(200);
    expect((await laptop.post("/api/designs").send({ name: "After promotion", content })).status).toBe(201);
    expect((await tablet.get("/api/auth/me")).body.role).toBe("engineer");
  });

  it("after sign-out the old session cookie gets 401 on the very next estimate", async () => {
    const content = await panel();
    const { agent, cookie } = await signIn("engineer");
    expect((await estimate(agent, content)).status).toBe(200);
    // The cookie alone is what the session cache keys on.
    expect((await estimateWithCookie(cookie, content)).status).toBe(200);

    expect((await agent.post("/api/auth/sign-out")).status).toBe(204);
    expect((await estimateWithCookie(cookie, content)).status).toBe(401);
    expect((await estimate(agent, content)).status).toBe(401);
  });

  it("a removed member's next request with their cookie is 401", async () => {
    const content = await panel();
    const technician = await t.signInAs("technician");
    expect((await estimate(technician, content)).status).toBe(200);

    const owner = await t.signInAs("owner");
    expect((await owner.delete(`/api/team/members/${await memberId(owner, "technician@kestrelbay.example")}`)).status).toBe(204);
    expect((await estimate(technician, content)).status).toBe(401);
    expect((await technician.get("/api/designs")).status).toBe(401);
  });

  it("a password reset ends the sessions it already knew: the next estimate with the old cookie is 401", async () => {
    const content = await panel();
    const { agent, cookie } = await signIn("viewer");
    expect((await estimate(agent, content)).status).toBe(200);

    await t.agent().post("/api/auth/password-reset").send({ email: "viewer@kestrelbay.example" });
    const mail = await t.smtp.waitFor((m) => m.to.includes("viewer@kestrelbay.example"));
    const token = tokenOf(linkIn(mail.text, "/reset-password/confirm?token="));
    expect((await t.agent().post("/api/auth/password-reset/confirm").send({ token, password: "a-new-viewer-password" })).status).toBe(200);
    expect((await estimateWithCookie(cookie, content)).status).toBe(401);
  });
});

describe("the library cache", () => {
  it("once the owner retires an organization material, the next identical estimate and sweep are a 400 naming the reference", async () => {
    const owner = await t.signInAs("owner");
    const finish = await approvedWallFinish(owner, "Bead-blasted vessel wall (invented)", 0.12);
    const content = withWarmFinish(await panel(), { materialId: finish.id, version: 1 });
    const engineer = await t.signInAs("engineer");
    await heatOf(engineer, content);
    expect((await sweep(engineer, content)).status).toBe(200);

    expect((await owner.post(`/api/materials/${finish.id}/retire`).send({ comment: "wall replaced" })).status).toBe(200);
    expect(refusedPaths(await estimate(engineer, content))).toEqual(["warm.finish"]);
    expect(refusedPaths(await sweep(engineer, content))).toEqual(["warm.finish"]);
  });

  it("a draft version 2 is refused until the owner approves it; the very next identical estimate uses its emissivity", async () => {
    const owner = await t.signInAs("owner");
    const finish = await approvedWallFinish(owner, "Oxidized vessel wall (invented)", 0.1);
    const base = await panel();
    const v1 = withWarmFinish(base, { materialId: finish.id, version: 1 });
    const v2 = withWarmFinish(base, { materialId: finish.id, version: 2 });
    const engineer = await t.signInAs("engineer");
    const heatV1 = await heatOf(engineer, v1);

    const proposal = await engineer.post(`/api/materials/${finish.id}/versions`).send(wallFinish("Oxidized vessel wall (invented)", 0.3, { changeNote: "remeasured after bake-out" }));
    expect(proposal.status).toBe(201);
    const draft = await estimate(engineer, v2);
    expect(refusedPaths(draft)).toEqual(["warm.finish"]);
    expect(draft.body.error.message).toMatch(/approved/);

    expect((await owner.post(`/api/materials/${finish.id}/approval`).send({ decision: "approve", version: 2 })).status).toBe(200);
    // A wall that emits three times as much lets more heat through the same blanket.
    expect(await heatOf(engineer, v2)).toBeGreaterThan(heatV1);
    expect(await heatOf(engineer, v1)).toBe(heatV1);
  });

  it("never resolves one organization's private material for another, even right after the first one's estimate", async () => {
    const owner = await t.signInAs("owner");
    const finish = await approvedWallFinish(owner, "Private lab wall (invented)", 0.15);
    const content = withWarmFinish(await panel(), { materialId: finish.id, version: 1 });
    await heatOf(owner, content);

    const other = (await t.signUpOtherOrganization()).agent;
    expect(refusedPaths(await estimate(other, content))).toEqual(["warm.finish"]);
    expect(refusedPaths(await sweep(other, content))).toEqual(["warm.finish"]);
    await heatOf(owner, content);
  });
});
