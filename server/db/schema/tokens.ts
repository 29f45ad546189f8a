import { index, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { ROLES } from "../../../shared/permissions";
import { datetimeMs, organizationId, rowId, userReference } from "./columns";
import { users } from "./users";

// Only a SHA-256 of each token is stored, so a database leak yields no usable link.
export const invitations = mysqlTable(
  "invitations",
  {
    id: rowId(),
    organizationId: organizationId(),
    email: varchar("email", { length: 254 }).notNull(),
    role: mysqlEnum("role", ROLES).notNull(),
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    invitedByUserId: userReference("invited_by_user_id"),
    expiresAt: datetimeMs("expires_at").notNull(),
    acceptedAt: datetimeMs("accepted_at"),
    revokedAt: datetimeMs("revoked_at"),
    createdAt: datetimeMs("created_at").notNull(),
  },
  (t) => [uniqueIndex("invitations_token_unique").on(t.tokenHash), index("invitations_org_idx").on(t.organizationId)],
);

export const passwordResetTokens = mysqlTable(
  "password_reset_tokens",
  {
    id: rowId(),
    userId: varchar("user_id", { length: 32 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    expiresAt: datetimeMs("expires_at").notNull(),
    usedAt: datetimeMs("used_at"),
    createdAt: datetimeMs("created_at").notNull(),
  },
  (t) => [uniqueIndex("password_reset_token_unique").on(t.tokenHash)],
);

