import { bigint, index, int, json, mysqlEnum, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { datetimeMs, organizationId, rowId } from "./columns";
import { organizations } from "./organizations";

export const auditLog = mysqlTable(
  "audit_log",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    organizationId: organizationId(),
    actorUserId: varchar("actor_user_id", { length: 32 }),
    action: varchar("action", { length: 64 }).notNull(),
    entityType: varchar("entity_type", { length: 32 }).notNull(),
    entityId: varchar("entity_id", { length: 64 }).notNull(),
    detail: json("detail").$type<Record<string, unknown>>(),
    createdAt: datetimeMs("created_at").notNull(),
  },
  (t) => [index("audit_org_idx").on(t.organizationId, t.createdAt)],
);

// Every message is written here first and sent by the outbox worker, so an SMTP outage
// delays mail but loses none.
export const emailOutbox = mysqlTable(
  "email_outbox",
  {
    id: rowId(),
    organizationId: varchar("organization_id", { length: 32 }).references(() => organizations.id, { onDelete: "cascade" }),
    toAddress: varchar("to_address", { length: 254 }).notNull(),
    subject: varchar("subject", { length: 200 }).notNull(),
    textBody: text("text_body").notNull(),
    status: mysqlEnum("status", ["pending", "sent", "failed"]).notNull().default("pending"),
    attempts: int("attempts").notNull().default(0),
    lastError: varchar("last_error", { length: 500 }),
    nextAttemptAt: datetimeMs("next_attempt_at").notNull(),
    createdAt: datetimeMs("created_at").notNull(),
    sentAt: datetimeMs("sent_at"),
  },
  (t) => [index("outbox_due_idx").on(t.status, t.nextAttemptAt), index("outbox_org_idx").on(t.organizationId)],
);
