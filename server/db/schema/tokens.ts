import { datetime, index, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { ROLES } from "../../../shared/permissions";
import { organizations } from "./organizations";
import { users } from "./users";

// Only a SHA-256 of each token is stored, so a database leak yields no usable link.
export const invitations = mysqlTable(
  "invitations",
  {
    id: varchar("id", { length: 32 }).primaryKey(),
    organizationId: varchar("organization_id", { length: 32 })
      .notNull()
      .references(() => organizations.id, { onDelete: "cascade" }),
    email: varchar("email", { length: 254 }).notNull(),
    role: mysqlEnum("role", ROLES).notNull(),
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    invitedByUserId: varchar("invited_by_user_id", { length: 32 }).references(() => users.id, { onDelete: "set null" }),
    expiresAt: datetime("expires_at", { mode: "date", fsp: 3 }).notNull(),
    acceptedAt: datetime("accepted_at", { mode: "date", fsp: 3 }),
    revokedAt: datetime("revoked_at", { mode: "date", fsp: 3 }),
    createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("invitations_token_unique").on(t.tokenHash), index("invitations_org_idx").on(t.organizationId)],
);

export const passwordResetTokens = mysqlTable(
  "password_reset_tokens",
  {
    id: varchar("id", { length: 32 }).primaryKey(),
    userId: varchar("user_id", { length: 32 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    expiresAt: datetime("expires_at", { mode: "date", fsp: 3 }).notNull(),
    usedAt: datetime("used_at", { mode: "date", fsp: 3 }),
    createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("password_reset_token_unique").on(t.tokenHash)],
);

