import { describe, expect, it } from "vitest";
import { ROLES, type Role } from "../../shared/permissions";
import { TeamSchema } from "../../shared/schemas/team";
import { countRows } from "../support/database";
import { linkIn, tokenOf, useTestApp } from "../support/test-app";

const t = useTestApp();

async function memberId(email: string): Promise<string> {
  const owner = await t.signInAs("owner");
  const team = TeamSchema.parse((await owner.get("/api/team/members")).body);
  return team.members.find((m) => m.email === email)!.id;
}

describe("team routes, role by role", () => {
  // What each role must get; 2xx codes vary by route, so compare the class.
  const expected: Record<Role, { read: number; manage: number }> = {
    owner: { read: 200, manage: 2 },
    engineer: { read: 200, manage: 403 },
    technician: { read: 200, manage: 403 },
    viewer: { read: 200, manage: 403 },
  };

  for (const role of ROLES) {
    it(`${role}: reads the team ${expected[role].manage === 403 ? "but may not change it" : "and may change it"}`, async () => {
      const viewerId = await memberId("viewer@kestrelbay.example");
      const agent = await t.signInAs(role);
      expect((await agent.get("/api/team/members")).status).toBe(expected[role].read);

      const invite = await agent.post("/api/team/invitations").send({ email: `new-${role}@kestrelbay.example`, role: "viewer" });
      const patch = await agent.patch(`/api/team/members/${viewerId}`).send({ role: "technician" });
      if (expected[role].manage === 403) {
        expect(invite.status).toBe(403);
        expect(patch.status).toBe(403);
        expect((await agent.delete(`/api/team/members/${viewerId}`)).status).toBe(403);
        expect(await countRows(t.ctx.db, "invitations")).toBe(0);
        expect(await countRows(t.ctx.db, "memberships")).toBe(4);
      } else {
        expect(invite.status).toBe(201);
        expect(patch.status).toBe(200);
        expect(patch.body.role).toBe("technician");
        expect((await agent.delete(`/api/invitations-none`)).status).toBe(404);
        expect((await agent.delete(`/api/team/invitations/${invite.body.id}`)).status).toBe(204);
        expect((await agent.delete(`/api/team/members/${viewerId}`)).status).toBe(204);
        expect(await countRows(t.ctx.db, "memberships")).toBe(3);
      }
    });
  }

  it("without a session every team route gives 401", async () => {
    const anon = t.agent();
    expect((await anon.get("/api/team/members")).status).toBe(401);
    expect((await anon.post("/api/team/invitations").send({ email: "a@b.example", role: "viewer" })).status).toBe(401);
    expect((await anon.patch("/api/team/members/abc").send({ role: "viewer" })).status).toBe(401);
    expect((await anon.delete("/api/team/members/abc")).status).toBe(401);
    expect((await anon.get("/api/outbox")).status).toBe(401);
  });

  it("the outbox is for owners only", async () => {
    expect((await (await t.signInAs("owner")).get("/api/outbox")).status).toBe(200);
    for (const role of ["engineer", "technician", "viewer"] as const) {
      expect((await (await t.signInAs(role)).get("/api/outbox")).status).toBe(403);
    }
  });
});

describe("the last owner", () => {
  it("cannot be demoted or removed", async () => {
    const owner = await t.signInAs("owner");
    const ownerId = await memberId("owner@kestrelbay.example");
    const demote = await owner.patch(`/api/team/members/${ownerId}`).send({ role: "engineer" });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe("last_owner");
    expect((await owner.delete(`/api/team/members/${ownerId}`)).status).toBe(409);
    expect((await owner.get("/api/auth/me")).body.role).toBe("owner");
  });

  it("can step down once another owner exists, and loses owner rights at once", async () => {
    const owner = await t.signInAs("owner");
    const engineerId = await memberId("engineer@kestrelbay.example");
    const ownerId = await memberId("owner@kestrelbay.example");
    expect((await owner.patch(`/api/team/members/${engineerId}`).send({ role: "owner" })).status).toBe(200);
    expect((await owner.patch(`/api/team/members/${ownerId}`).send({ role: "viewer" })).status).toBe(200);
    expect((await owner.post("/api/team/invitations").send({ email: "late@kestrelbay.example", role: "viewer" })).status).toBe(403);
  });
});

describe("bad input", () => {
  it("names the field and the allowed values, and writes nothing", async () => {
    const owner = await t.signInAs("owner");
    const res = await owner.post("/api/team/invitations").send({ email: "not-mail", role: "admin" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(["email", "role"]);
    expect(res.body.error.fields.find((f: { path: string }) => f.path === "role").message).toMatch(/owner, engineer, technician, viewer/);
    const viewerId = await memberId("viewer@kestrelbay.example");
    expect((await owner.patch(`/api/team/members/${viewerId}`).send({ role: "boss" })).status).toBe(400);
    expect(await countRows(t.ctx.db, "invitations")).toBe(0);
  });
});

describe("a second organization", () => {
  it("can neither see nor change the first one's members", async () => {
    const viewerId = await memberId("viewer@kestrelbay.example");
    const other = await t.signUpOtherOrganization();
    const team = TeamSchema.parse((await other.agent.get("/api/team/members")).body);
    expect(team.members.map((m) => m.email)).toEqual(["owner@otherlab.example"]);
    expect((await other.agent.patch(`/api/team/members/${viewerId}`).send({ role: "owner" })).status).toBe(404);
    expect((await other.agent.delete(`/api/team/members/${viewerId}`)).status).toBe(404);
    const kestrel = TeamSchema.parse((await (await t.signInAs("owner")).get("/api/team/members")).body);
    expect(kestrel.members.find((m) => m.id === viewerId)?.role).toBe("viewer");
  });

  it("cannot revoke the first one's invitations or read its outbox", async () => {
    const owner = await t.signInAs("owner");
    const invite = await owner.post("/api/team/invitations").send({ email: "second.tech@kestrelbay.example", role: "technician" });
    const other = await t.signUpOtherOrganization();
    expect((await other.agent.delete(`/api/team/invitations/${invite.body.id}`)).status).toBe(404);
    expect((await other.agent.get("/api/outbox")).body.messages).toEqual([]);
    expect((await owner.get("/api/outbox")).body.messages).toHaveLength(1);
  });
});

describe("invitations by e-mail", () => {
  it("the invitee follows the link, sets name and password, and joins with the role", async () => {
    const owner = await t.signInAs("owner");
    await owner.post("/api/team/invitations").send({ email: "Cryo.Tech@Kestrelbay.example", role: "technician" });
    const mail = await t.smtp.waitFor((m) => m.to.includes("cryo.tech@kestrelbay.example"));
    expect(mail.subject).toBe("You are invited to Kestrel Bay Research Station on Frostfold");
    const link = linkIn(mail.text, "/invitations/accept?token=");
    const token = tokenOf(link);

    const preview = await t.agent().get(`/api/invitations/${token}`);
    expect(preview.body).toEqual({ email: "cryo.tech@kestrelbay.example", role: "technician", organizationName: "Kestrel Bay Research Station" });

    const invitee = t.agent();
    const accept = await invitee.post("/api/invitations/accept").send({ token, name: "Noor Castellan", password: "invitee-password-1" });
    expect(accept.status).toBe(200);
    expect(accept.body.role).toBe("technician");
    expect(accept.body.organization.name).toBe("Kestrel Bay Research Station");
    expect((await invitee.get("/api/auth/me")).body.user.name).toBe("Noor Castellan");

    const again = await t.agent().post("/api/invitations/accept").send({ token, name: "Someone Else", password: "another-password" });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe("invalid_token");
    expect(await countRows(t.ctx.db, "memberships")).toBe(5);

    const outbox = (await owner.get("/api/outbox")).body.messages;
    expect(outbox[0].links).toEqual([link]);
    expect(outbox[0].status).toBe("sent");
  });

  it("refuses a link older than 7 days", async () => {
    const owner = await t.signInAs("owner");
    await owner.post("/api/team/invitations").send({ email: "late@kestrelbay.example", role: "viewer" });
    const mail = await t.smtp.waitFor((m) => m.to.includes("late@kestrelbay.example"));
    const token = tokenOf(linkIn(mail.text, "/invitations/accept"));
    const realClock = t.ctx.clock;
    t.ctx.clock = () => new Date(realClock().getTime() + 7 * 24 * 3600 * 1000 + 1000);
    try {
      expect((await t.agent().get(`/api/invitations/${token}`)).status).toBe(400);
      const res = await t.agent().post("/api/invitations/accept").send({ token, name: "Late Comer", password: "late-password-1" });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("invalid_token");
    } finally {
      t.ctx.clock = realClock;
    }
    expect(await countRows(t.ctx.db, "users")).toBe(4);
  });

  it("refuses a revoked invitation and an e-mail that already has an account", async () => {
    const owner = await t.signInAs("owner");
    const invite = await owner.post("/api/team/invitations").send({ email: "gone@kestrelbay.example", role: "viewer" });
    const mail = await t.smtp.waitFor((m) => m.to.includes("gone@kestrelbay.example"));
    await owner.delete(`/api/team/invitations/${invite.body.id}`);
    const res = await t.agent().post("/api/invitations/accept").send({ token: tokenOf(linkIn(mail.text, "/invitations/accept")), name: "Gone", password: "gone-password-1" });
    expect(res.status).toBe(400);
    const dup = await owner.post("/api/team/invitations").send({ email: "viewer@kestrelbay.example", role: "viewer" });
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe("already_member");
  });

  it("writes the audit log for invitations and role changes", async () => {
    const owner = await t.signInAs("owner");
    await owner.post("/api/team/invitations").send({ email: "audit@kestrelbay.example", role: "viewer" });
    const viewerId = await memberId("viewer@kestrelbay.example");
    await owner.patch(`/api/team/members/${viewerId}`).send({ role: "engineer" });
    const actions = (await t.ctx.db.query.auditLog.findMany()).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(["invitation.create", "member.role_change"]));
  });
});

describe("removing a member", () => {
  it("ends their sessions at once", async () => {
    const viewer = await t.signInAs("viewer");
    const owner = await t.signInAs("owner");
    const viewerId = await memberId("viewer@kestrelbay.example");
    expect((await owner.delete(`/api/team/members/${viewerId}`)).status).toBe(204);
    expect((await viewer.get("/api/auth/me")).status).toBe(401);
  });
});
