import { eq } from "drizzle-orm";
import type { Tx } from "../client";
import { organizations } from "../schema";

/** The organization's alert threshold (measured over predicted); null when the organization is gone. */
export async function findAlertThreshold(db: Tx, organizationId: string): Promise<number | null> {
  const [row] = await db.select({ threshold: organizations.alertThreshold }).from(organizations).where(eq(organizations.id, organizationId)).limit(1);
  return row ? Number(row.threshold) : null;
}

export async function updateAlertThreshold(db: Tx, organizationId: string, threshold: number) {
  await db.update(organizations).set({ alertThreshold: threshold }).where(eq(organizations.id, organizationId));
}
