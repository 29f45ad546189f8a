import { and, desc, eq } from "drizzle-orm";
import type { Tx } from "../client";
import { auditLog } from "../schema";

export interface AuditEntry {
  actorUserId: string | null;
  action: string;
  entityType: string;
  entityId: string;
  detail?: Record<string, unknown>;
}

export async function insertAuditEntry(db: Tx, organizationId: string, entry: AuditEntry, now: Date) {
  await db.insert(auditLog).values({ organizationId, ...entry, createdAt: now });
}

export async function listAuditEntries(db: Tx, organizationId: string, entityType?: string) {
  const where = entityType ? and(eq(auditLog.organizationId, organizationId), eq(auditLog.entityType, entityType)) : eq(auditLog.organizationId, organizationId);
  return db.select().from(auditLog).where(where).orderBy(desc(auditLog.id)).limit(200);
}
