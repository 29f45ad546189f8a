import { and, asc, desc, eq, lte } from "drizzle-orm";
import type { Tx } from "../client";
import { emailOutbox } from "../schema";

export async function enqueueEmail(
  db: Tx,
  organizationId: string | null,
  row: { id: string; toAddress: string; subject: string; textBody: string; now: Date },
) {
  await db.insert(emailOutbox).values({
    id: row.id,
    organizationId,
    toAddress: row.toAddress,
    subject: row.subject,
    textBody: row.textBody,
    status: "pending",
    attempts: 0,
    nextAttemptAt: row.now,
    createdAt: row.now,
  });
}

export async function listOutbox(db: Tx, organizationId: string) {
  return db.select().from(emailOutbox).where(eq(emailOutbox.organizationId, organizationId)).orderBy(desc(emailOutbox.createdAt)).limit(100);
}

/** Mail due for a (re)try, across organizations: only the sender worker calls this. */
export async function listDueEmails(db: Tx, now: Date, limit: number) {
  return db
    .select()
    .from(emailOutbox)
    .where(and(eq(emailOutbox.status, "pending"), lte(emailOutbox.nextAttemptAt, now)))
    .orderBy(asc(emailOutbox.createdAt))
    .limit(limit);
}

export async function markEmailSent(db: Tx, id: string, now: Date) {
  await db.update(emailOutbox).set({ status: "sent", sentAt: now, lastError: null }).where(eq(emailOutbox.id, id));
}

export async function markEmailAttemptFailed(db: Tx, id: string, attempts: number, error: string, retryAt: Date | null) {
  await db
    .update(emailOutbox)
    .set({ attempts, lastError: error.slice(0, 500), ...(retryAt ? { nextAttemptAt: retryAt } : { status: "failed" as const }) })
    .where(eq(emailOutbox.id, id));
}
