import { datetime, mysqlTable, varchar, decimal } from "drizzle-orm/mysql-core";

export const organizations = mysqlTable("organizations", {
  id: varchar("id", { length: 32 }).primaryKey(),
  name: varchar("name", { length: 120 }).notNull(),
  // Measured over predicted heat leak above which an accepted test raises an alert.
  alertThreshold: decimal("alert_threshold", { precision: 6, scale: 3, mode: "number" }).notNull().default(1.25),
  createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
});
