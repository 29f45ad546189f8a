import { datetime, varchar } from "drizzle-orm/mysql-core";
import { organizations } from "./organizations";
import { users } from "./users";

// Columns most tables share. Each is a function, so every table gets its own column builder.
// users.ts cannot use these (this file imports it), so its tables spell them out.

/** A row's own id: 32 characters, the primary key. */
export const rowId = () => varchar("id", { length: 32 }).primaryKey();

/** The organization a row belongs to; deleting the organization deletes the row. */
export const organizationId = () =>
  varchar("organization_id", { length: 32 })
    .notNull()
    .references(() => organizations.id, { onDelete: "cascade" });

/** A user who did something to the row; the row stays (with NULL) when the user is deleted. */
export const userReference = (name: string) => varchar(name, { length: 32 }).references(() => users.id, { onDelete: "set null" });

/** A moment to the millisecond, read as a Date. */
export const datetimeMs = (name: string) => datetime(name, { mode: "date", fsp: 3 });
