import type { Server } from "node:http";
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import supertest from "supertest";
import { afterAll, beforeAll, beforeEach, inject } from "vitest";
import { createApp } from "../../server/app";
import { buildContext } from "../../server/bootstrap";
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from "../../server/db/seed/demo";
import { seedLibrary } from "../../server/db/seed/library";
import { parseEnv } from "../../server/env";
import { newId } from "../../server/ids";
import { startSmtpFake, type SmtpFake } from "../../server/mail/smtp-fake";
import { hashPassword } from "../../server/services/passwords";
import { startS3Fake, type S3Fake } from "../../server/storage/s3-fake";
import type { Role } from "../../shared/permissions";
import { resetDatabase } from "./database";

export const TEST_ORIGIN = "http://frostfold.test";

/**
 * The real app in-process on port 0, against the test MariaDB, with its own SMTP fake.
 * `agent()` is a cookie-keeping client that sends our Origin like a browser on our page would.
 */
export async function startTestApp(envOverrides: Record<string, string> = {}) {
  const smtp: SmtpFake = await startSmtpFake(0);
  // Each test file gets its own object store: an s3rver on port 0 in a temporary folder.
  const s3Dir = await mkdtemp(path.join(os.tmpdir(), "frostfold-test-s3-"));
  const s3: S3Fake = await startS3Fake({ port: 0, directory: s3Dir, bucket: "frostfold-test" });
  const env = parseEnv({
    NODE_ENV: "test",
    DATABASE_URL: inject("databaseUrl"),
    APP_ORIGIN: TEST_ORIGIN,
    MAIL_MODE: "local",
    SMTP_PORT: String(smtp.port),
    LOG_LEVEL: "silent",
    SIGN_IN_LIMIT_PER_IP: "10000",
    SIGN_IN_LIMIT_PER_EMAIL: "10000",
    CLIENT_DIST: "does-not-exist",
    COOKIE_SECURE: "false",
    S3_ENDPOINT: s3.endpoint,
    S3_BUCKET: s3.bucket,
    ...envOverrides,
  });
  const { ctx, close } = buildContext(env);
  const server: Server = await new Promise((resolve) => {
    const s = createApp(ctx).listen(0, "127.0.0.1", () => resolve(s));
  });

  const agent = () => supertest.agent(server).set("Origin", TEST_ORIGIN);

  return {
    ctx,
    smtp,
    s3,
    server,
    agent,
    /** Empties every table and seeds the demo organization again. */
    async reset() {
      // Let mail queued by the previous test land first, so it cannot be mistaken for this test's.
      await ctx.outbox.flush();
      await resetDatabase(ctx.db);
      smtp.clear();
      await s3.reset();
      await seedDemo(ctx.db, { hashPassword, newId, now: new Date() });
      await seedLibrary(ctx.db, { newId, now: new Date() });
    },
    async signInAs(role: Role) {
      const a = agent();
      const user = DEMO_USERS.find((u) => u.role === role)!;
      const res = await a.post("/api/auth/sign-in").send({ email: user.email, password: DEMO_PASSWORD });
      if (res.status !== 200) throw new Error(`could not sign in as ${role}: ${res.status} ${JSON.stringify(res.body)}`);
      return a;
    },
    /** A second, unrelated organization with its own owner, signed in. */
    async signUpOtherOrganization(email = "owner@otherlab.example") {
      const a = agent();
      const res = await a.post("/api/auth/sign-up").send({ name: "Other Owner", email, password: "other-lab-password", organizationName: "Other Lab" });
      if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
      return { agent: a, me: res.body };
    },
    async stop() {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await close();
      await smtp.stop();
      await s3.stop();
      await rm(s3Dir, { recursive: true, force: true });
    },
  };
}
export type TestApp = Awaited<ReturnType<typeof startTestApp>>;

export interface UseTestAppOptions {
  /** Passed to startTestApp as its environment overrides. */
  env?: Parameters<typeof startTestApp>[0];
  /** Reset the database before each test (default). Off for a second app sharing another's database. */
  reset?: boolean;
}

/**
 * Registers a file's app lifecycle: start in beforeAll, stop in afterAll, reset in beforeEach.
 * Before-hooks run in registration order (after-hooks in reverse), so a file's own beforeEach comes after this reset.
 * The app exists only once beforeAll has run, so the handle forwards to it: tests keep writing
 * `t.agent()` and `t.ctx.db`, and a use at file load fails loudly rather than on undefined.
 */
export function useTestApp(options: UseTestAppOptions = {}): TestApp {
  let app: TestApp | undefined;
  beforeAll(async () => {
    app = await startTestApp(options.env);
  });
  // Optional so a failed start reports its own error, not a second one from here.
  afterAll(async () => app?.stop());
  if (options.reset ?? true) beforeEach(async () => app!.reset());

  return new Proxy({} as TestApp, {
    get(_, key) {
      if (!app) throw new Error(`useTestApp: read "${String(key)}" before beforeAll started the app; use it inside a test or hook`);
      const value: unknown = Reflect.get(app, key);
      return typeof value === "function" ? value.bind(app) : value;
    },
  });
}

/** The first link in a caught message's text. */
export function linkIn(text: string, path: string): string {
  const match = text.match(new RegExp(`https?://[^\\s]+${path.replace(/[/?]/g, "\\$&")}[^\\s]*`));
  if (!match) throw new Error(`no ${path} link in:\n${text}`);
  return match[0];
}
export const tokenOf = (link: string) => new URL(link).searchParams.get("token") ?? "";
