import type { OutboxMessage } from "../../shared/schemas/team";
import { listOutbox } from "../db/repositories/outbox";
import { AppError } from "../errors";
import { linksIn } from "../mail/templates";
import type { Actor, ServiceContext } from "./context";

/** Only while mail goes to the local SMTP fake: in production links must stay in inboxes. */
export async function listLocalOutbox(ctx: ServiceContext, actor: Actor): Promise<OutboxMessage[]> {
  if (ctx.env.MAIL_MODE !== "local") throw new AppError(404, "not_found", "The outbox is shown only while mail goes to the local SMTP fake.");
  const rows = await listOutbox(ctx.db, actor.organizationId);
  return rows.map((r) => ({
    id: r.id,
    to: r.toAddress,
    subject: r.subject,
    text: r.textBody,
    links: linksIn(r.textBody),
    status: r.status,
    attempts: r.attempts,
    createdAt: r.createdAt.toISOString(),
    sentAt: r.sentAt ? r.sentAt.toISOString() : null,
  }));
}
