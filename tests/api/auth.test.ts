import { describe, expect, it } from "vitest";
import { ErrorBodySchema } from "../../shared/schemas/common";
import { MeSchema } from "../../shared/schemas/auth";
import { DEMO_PASSWORD } from "../../server/db/seed/demo";
import { countRows } from "../support/database";
import { linkIn, startTestApp, tokenOf, useTestApp } from "../support/test-app";

const t = useTestApp();

const newAccount = { name: "Iris Vance", email: "Iris@Northfen.example", password: "a-long-password-1", organizationName: "Northfen Cryo Lab" };

describe("POST /api/auth/sign-up", () => {
  it("creates an organization whose creator is its owner, and signs them in", async () => {
    const agent = t.agent();
    const res = await agent.post("/api/auth/sign-up").send(newAccount);
    expect(res.status).toBe(201);
    const me = MeSchema.parse(res.body);
    expect(me.role).toBe("owner");
    expect(me.user.email).toBe("iris@northfen.example");
    expect(me.organization.name).toBe("Northfen Cryo Lab");
    expect(me.permissions).toContain("manage:team");
    const cookie = String(res.headers["set-cookie"]);
    expect(cookie).toMatch(/frostfold_session=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect((await agent.get("/api/auth/me")).body.user.name).toBe("Iris Vance");
  });

  it("stores an argon2id hash, never the password", async () => {
    await t.agent().post("/api/auth/sign-up").send(newAccount);
    const user = await t.ctx.db.query.users.findFirst({ where: (u, { eq }) => eq(u.email, "iris@northfen.example") });
    expect(user?.passwordHash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
    expect(user?.passwordHash).not.toContain(newAccount.password);
  });

  it("names every bad field and writes nothing", async () => {
    const before = await countRows(t.ctx.db, "users");
    const res = await t.agent().post("/api/auth/sign-up").send({ name: "", email: "not-an-email", password: "short", organizationName: "X" });
    expect(res.status).toBe(400);
    const body = ErrorBodySchema.parse(res.body);
    expect(body.error.code).toBe("invalid_input");
    const paths = body.error.fields?.map((f) => f.path).sort();
    expect(paths).toEqual(["email", "name", "organizationName", "password"]);
    expect(body.error.fields?.find((f) => f.path === "password")?.message).toMatch(/at least 10 characters/);
    expect(await countRows(t.ctx.db, "users")).toBe(before);
    expect(await countRows(t.ctx.db, "organizations")).toBe(1);
  });

  it("refuses a second account with the same e-mail", async () => {
    await t.agent().post("/api/auth/sign-up").send(newAccount);
    const res = await t.agent().post("/api/auth/sign-up").send({ ...newAccount, organizationName: "Another" });
    expect(res.status).toBe(409);
    expect(await countRows(t.ctx.db, "organizations")).toBe(2);
  });

  it("answers malformed JSON with a 400, not a 500", async () => {
    const res = await t.agent().post("/api/auth/sign-up").set("Content-Type", "application/json").send("{not json");
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid_json");
  });
});

describe("POST /api/auth/sign-in and sign-out", () => {
  it("signs in the demo owner, and sign-out ends the session", async () => {
    const agent = t.agent();
    const res = await agent.post("/api/auth/sign-in").send({ email: "owner@kestrelbay.example", password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe("owner");
    expect((await agent.get("/api/auth/me")).status).toBe(200);
    expect((await agent.post("/api/auth/sign-out")).status).toBe(204);
    expect((await agent.get("/api/auth/me")).status).toBe(401);
    expect(await countRows(t.ctx.db, "sessions")).toBe(0);
  });

  it("gives the same answer for a wrong password and an unknown e-mail", async () => {
    const wrongPassword = await t.agent().post("/api/auth/sign-in").send({ email: "owner@kestrelbay.example", password: "wrong-password" });
    const unknown = await t.agent().post("/api/auth/sign-in").send({ email: "nobody@kestrelbay.example", password: "wrong-password" });
    expect(wrongPassword.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrongPassword.body).toEqual(unknown.body);
    expect(wrongPassword.headers["set-cookie"]).toBeUndefined();
  });

  it("gives 401 on /me without a session and with a forged cookie", async () => {
    expect((await t.agent().get("/api/auth/me")).status).toBe(401);
    const forged = await t.agent().get("/api/auth/me").set("Cookie", "frostfold_session=forgedforgedforgedforged");
    expect(forged.status).toBe(401);
  });
});

describe("rate limit on sign-in", () => {
  it("refuses the e-mail after too many failures, even with the right password", async () => {
    const limited = await startTestApp({ SIGN_IN_LIMIT_PER_EMAIL: "3", SIGN_IN_LIMIT_PER_IP: "100" });
    try {
      await limited.reset();
      const email = "engineer@kestrelbay.example";
      for (let i = 0; i < 3; i++) {
        expect((await limited.agent().post("/api/auth/sign-in").send({ email, password: "guess-" + i })).status).toBe(401);
      }
      const blocked = await limited.agent().post("/api/auth/sign-in").send({ email, password: DEMO_PASSWORD });
      expect(blocked.status).toBe(429);
      expect(blocked.body.error.code).toBe("rate_limited");
      // Another e-mail from the same address is still allowed.
      const other = await limited.agent().post("/api/auth/sign-in").send({ email: "viewer@kestrelbay.example", password: DEMO_PASSWORD });
      expect(other.status).toBe(200);
    } finally {
      await limited.stop();
    }
  });

  it("refuses an address after too many attempts across e-mails", async () => {
    const limited = await startTestApp({ SIGN_IN_LIMIT_PER_EMAIL: "100", SIGN_IN_LIMIT_PER_IP: "4" });
    try {
      await limited.reset();
      for (let i = 0; i < 4; i++) await limited.agent().post("/api/auth/sign-in").send({ email: `x${i}@a.example`, password: "whatever-pass" });
      const blocked = await limited.agent().post("/api/auth/sign-in").send({ email: "owner@kestrelbay.example", password: DEMO_PASSWORD });
      expect(blocked.status).toBe(429);
    } finally {
      await limited.stop();
    }
  });
});

describe("origin check", () => {
  it("refuses a state-changing request from another origin or with none", async () => {
    const body = { email: "owner@kestrelbay.example", password: DEMO_PASSWORD };
    const foreign = await t.agent().post("/api/auth/sign-in").set("Origin", "http://evil.example").send(body);
    expect(foreign.status).toBe(403);
    expect(foreign.body.error.code).toBe("bad_origin");
    const none = await (await import("supertest")).default(t.server).post("/api/auth/sign-in").send(body);
    expect(none.status).toBe(403);
    expect(await countRows(t.ctx.db, "sessions")).toBe(0);
  });

  it("lets reads through without an Origin", async () => {
    const res = await (await import("supertest")).default(t.server).get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body.database.status).toBe("ok");
  });
});

describe("password reset", () => {
  it("always answers 202, and mails only a known address", async () => {
    const unknown = await t.agent().post("/api/auth/password-reset").send({ email: "nobody@kestrelbay.example" });
    const known = await t.agent().post("/api/auth/password-reset").send({ email: "viewer@kestrelbay.example" });
    expect(unknown.status).toBe(202);
    expect(known.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    const mail = await t.smtp.waitFor((m) => m.to.includes("viewer@kestrelbay.example"));
    expect(mail.subject).toMatch(/Reset your Frostfold password/);
    await t.ctx.outbox.flush();
    expect(t.smtp.messages.filter((m) => m.to.includes("nobody@kestrelbay.example"))).toHaveLength(0);
  });

  it("follows the e-mailed link once: new password works, old sessions end, link is spent", async () => {
    const oldSession = await t.signInAs("viewer");
    await t.agent().post("/api/auth/password-reset").send({ email: "viewer@kestrelbay.example" });
    const mail = await t.smtp.waitFor((m) => m.to.includes("viewer@kestrelbay.example"));
    const link = linkIn(mail.text, "/reset-password/confirm?token=");
    expect(link.startsWith("http://frostfold.test/reset-password/confirm?token=")).toBe(true);

    const confirm = await t.agent().post("/api/auth/password-reset/confirm").send({ token: tokenOf(link), password: "brand-new-password" });
    expect(confirm.status).toBe(200);
    expect((await oldSession.get("/api/auth/me")).status).toBe(401);
    const withNew = await t.agent().post("/api/auth/sign-in").send({ email: "viewer@kestrelbay.example", password: "brand-new-password" });
    expect(withNew.status).toBe(200);
    const withOld = await t.agent().post("/api/auth/sign-in").send({ email: "viewer@kestrelbay.example", password: DEMO_PASSWORD });
    expect(withOld.status).toBe(401);

    const reuse = await t.agent().post("/api/auth/password-reset/confirm").send({ token: tokenOf(link), password: "another-password-2" });
    expect(reuse.status).toBe(400);
    expect(reuse.body.error.code).toBe("invalid_token");
  });

  it("refuses an expired link and leaves the password alone", async () => {
    await t.agent().post("/api/auth/password-reset").send({ email: "viewer@kestrelbay.example" });
    const mail = await t.smtp.waitFor((m) => m.to.includes("viewer@kestrelbay.example"));
    const realClock = t.ctx.clock;
    t.ctx.clock = () => new Date(realClock().getTime() + 61 * 60 * 1000);
    try {
      const res = await t.agent().post("/api/auth/password-reset/confirm").send({ token: tokenOf(linkIn(mail.text, "/reset-password")), password: "too-late-password" });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("invalid_token");
    } finally {
      t.ctx.clock = realClock;
    }
    expect((await t.agent().post("/api/auth/sign-in").send({ email: "viewer@kestrelbay.example", password: DEMO_PASSWORD })).status).toBe(200);
  });

  it("keeps the mail when SMTP is down and delivers it once SMTP is back", async () => {
    const broken = await startTestApp({ SMTP_PORT: "1" });
    try {
      await broken.reset();
      await broken.agent().post("/api/auth/password-reset").send({ email: "engineer@kestrelbay.example" });
      await broken.ctx.outbox.flush();
      const row = await broken.ctx.db.query.emailOutbox.findFirst();
      expect(row?.status).toBe("pending");
      expect(row?.attempts).toBe(1);
      expect(row?.lastError).toBeTruthy();
    } finally {
      await broken.stop();
    }
    // The same row, picked up by an app whose SMTP works, once its retry time has come.
    const realClock = t.ctx.clock;
    const row = await t.ctx.db.query.emailOutbox.findFirst();
    expect(row).toBeTruthy();
    t.ctx.clock = () => new Date(realClock().getTime() + 60_000);
    try {
      await t.ctx.outbox.flush();
    } finally {
      t.ctx.clock = realClock;
    }
    const mail = await t.smtp.waitFor((m) => m.to.includes("engineer@kestrelbay.example"));
    expect(mail.subject).toMatch(/Reset/);
    expect((await t.ctx.db.query.emailOutbox.findFirst())?.status).toBe("sent");
  });
});

describe("PATCH /api/auth/me/preferences", () => {
  it("stores the unit system for the signed-in user only", async () => {
    const viewer = await t.signInAs("viewer");
    const res = await viewer.patch("/api/auth/me/preferences").send({ unitSystem: "us" });
    expect(res.status).toBe(200);
    expect(res.body.user.unitSystem).toBe("us");
    expect((await viewer.get("/api/auth/me")).body.user.unitSystem).toBe("us");
    expect((await (await t.signInAs("owner")).get("/api/auth/me")).body.user.unitSystem).toBe("si");
  });

  it("refuses an unknown unit system and needs a session", async () => {
    const viewer = await t.signInAs("viewer");
    const bad = await viewer.patch("/api/auth/me/preferences").send({ unitSystem: "imperial" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0]).toEqual({ path: "unitSystem", message: "unitSystem must be si or us" });
    expect((await t.agent().patch("/api/auth/me/preferences").send({ unitSystem: "us" })).status).toBe(401);
  });
});
