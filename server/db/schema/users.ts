import { boolean, datetime, mysqlEnum, mysqlTable, uniqueIndex, varchar, index } from "drizzle-orm/mysql-core";
import { ROLES } from "../../../shared/permissions";
import { organizations } from "./organizations";

export const users = mysqlTable(
  "users",
  {
    id: varchar("id", { length: 32 }).primaryKey(),
    email: varchar("email", { length: 254 }).notNull(),
    name: varchar("name", { length: 100 }).notNull(),
    passwordHash: varchar("password_hash", { length: 255 }).notNull(),
    unitSystem: mysqlEnum("unit_system", ["si", "us"]).notNull().default("si"),
    /** Alert e-mails (a test over its prediction) for the owners and the design's engineers; each may opt out. */
    alertEmails: boolean("alert_emails").notNull().default(true),
    createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("users_email_unique").on(t.email)],
);

// One organization per account for now (a unique user_id); see the decision log.
export const memberships = mysqlTable(
  "memberships",
  {
    id: varchar("id", { length: 32 }).primaryKey(),
    organizationId: varchar("organization_id", { length: 32 })
      .notNull()
      .references(() => organizations.id, { onDelete: "cascade" }),
    userId: varchar("user_id", { length: 32 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: mysqlEnum("role", ROLES).notNull(),
    createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("memberships_user_unique").on(t.userId), index("memberships_org_idx").on(t.organizationId)],
);

// Column names follow lucia's Drizzle MySQL adapter: id, user_id, expires_at.
export const sessions = mysqlTable("sessions", {
  id: varchar("id", { length: 255 }).primaryKey(),
  userId: varchar("user_id", { length: 32 })
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  expiresAt: datetime("expires_at", { mode: "date" }).notNull(),
});
