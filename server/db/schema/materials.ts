import { double, index, int, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { MATERIAL_KINDS, MATERIAL_STATUSES, VERSION_STATUSES, type MaterialProperties, type MaterialSource } from "../../../shared/schemas/material";
import { datetimeMs, rowId, userReference } from "./columns";
import { jsonText } from "./json-text";
import { organizations } from "./organizations";

/**
 * One library entry. organization_id NULL marks a global seed entry, shared read-only by every
 * organization. status, name and the version pointers mirror its versions, kept by the service.
 */
export const materials = mysqlTable(
  "materials",
  {
    id: rowId(),
    organizationId: varchar("organization_id", { length: 32 }).references(() => organizations.id, { onDelete: "cascade" }),
    kind: mysqlEnum("kind", MATERIAL_KINDS).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    status: mysqlEnum("status", MATERIAL_STATUSES).notNull(),
    currentVersion: int("current_version"),
    latestVersion: int("latest_version").notNull(),
    draftVersion: int("draft_version"),
    copiedFromMaterialId: varchar("copied_from_material_id", { length: 32 }),
    copiedFromVersion: int("copied_from_version"),
    retiredAt: datetimeMs("retired_at"),
    retiredByUserId: userReference("retired_by_user_id"),
    retireComment: varchar("retire_comment", { length: 1000 }),
    createdAt: datetimeMs("created_at").notNull(),
    updatedAt: datetimeMs("updated_at").notNull(),
  },
  // The collation is case-insensitive, so "Copper" and "copper" collide within one organization.
  (t) => [uniqueIndex("materials_org_name_unique").on(t.organizationId, t.name), index("materials_org_kind_idx").on(t.organizationId, t.kind)],
);

/** Every version of an entry. Approved rows are never updated again: designs point at them. */
export const materialVersions = mysqlTable(
  "material_versions",
  {
    id: rowId(),
    materialId: varchar("material_id", { length: 32 })
      .notNull()
      .references(() => materials.id, { onDelete: "cascade" }),
    version: int("version").notNull(),
    status: mysqlEnum("status", VERSION_STATUSES).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    properties: jsonText<MaterialProperties>("properties").notNull(),
    validMinK: double("valid_min_k").notNull(),
    validMaxK: double("valid_max_k").notNull(),
    thicknessM: double("thickness_m"),
    arealMassKgPerM2: double("areal_mass_kg_per_m2"),
    costPerM2: double("cost_per_m2"),
    source: jsonText<MaterialSource>("source").notNull(),
    changeNote: varchar("change_note", { length: 500 }),
    proposedByUserId: userReference("proposed_by_user_id"),
    proposedAt: datetimeMs("proposed_at").notNull(),
    decidedByUserId: userReference("decided_by_user_id"),
    decidedAt: datetimeMs("decided_at"),
    decisionComment: varchar("decision_comment", { length: 1000 }),
  },
  (t) => [uniqueIndex("material_versions_unique").on(t.materialId, t.version)],
);
