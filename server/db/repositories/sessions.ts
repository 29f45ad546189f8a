import { DrizzleMySQLAdapter } from "@lucia-auth/adapter-drizzle";
import { Lucia } from "lucia";
import type { Db } from "../client";
import { sessions, users } from "../schema";

/** lucia over the sessions table; 30-day sessions, extended when half used. */
export function createSessionStore(db: Db, secure: boolean) {
  const adapter = new DrizzleMySQLAdapter(db, sessions, users);
  return new Lucia(adapter, {
    sessionCookie: { name: "frostfold_session", expires: true, attributes: { secure, sameSite: "lax", path: "/" } },
  });
}
export type SessionStore = ReturnType<typeof createSessionStore>;
