import { double, index, int, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import type { DesignContent } from "../../../shared/schemas/design";
import type { ResolvedMaterial } from "../../../shared/design/to-assembly";
import type { Prediction } from "../../../shared/design/prediction";
import { datetimeMs, organizationId, rowId, userReference } from "./columns";
import { jsonText } from "./json-text";

export const designs = mysqlTable(
  "designs",
  {
    id: rowId(),
    organizationId: organizationId(),
    name: varchar("name", { length: 120 }).notNull(),
    vesselLabel: varchar("vessel_label", { length: 120 }),
    geometryKind: mysqlEnum("geometry_kind", ["planar", "cylinder", "sphere"]).notNull(),
    latestRevision: int("latest_revision").notNull(),
    /** From the latest revision's prediction, so the list needs no JSON parsing. */
    coldHeat_W: double("cold_heat_w"),
    boilOff_L_per_day: double("boil_off_l_per_day"),
    createdByUserId: userReference("created_by_user_id"),
    createdAt: datetimeMs("created_at").notNull(),
    updatedAt: datetimeMs("updated_at").notNull(),
  },
  (t) => [index("designs_org_idx").on(t.organizationId, t.updatedAt)],
);

/** The design a row belongs to; deleting the design deletes the row. */
export const designReference = () =>
  varchar("design_id", { length: 32 })
    .notNull()
    .references(() => designs.id, { onDelete: "cascade" });

// A revision is an immutable snapshot: its content, the exact material versions it resolved and
// the prediction computed then, so a test always points at the prediction that held when it ran.
export const designRevisions = mysqlTable(
  "design_revisions",
  {
    id: rowId(),
    organizationId: organizationId(),
    designId: designReference(),
    revision: int("revision").notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    content: jsonText<DesignContent>("content").notNull(),
    materials: jsonText<ResolvedMaterial[]>("materials").notNull(),
    prediction: jsonText<Prediction>("prediction").notNull(),
    changeNote: varchar("change_note", { length: 500 }),
    createdByUserId: userReference("created_by_user_id"),
    createdAt: datetimeMs("created_at").notNull(),
  },
  (t) => [uniqueIndex("design_revision_unique").on(t.designId, t.revision), index("design_revisions_org_idx").on(t.organizationId)],
);
