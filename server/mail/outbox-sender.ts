import type { Db } from "../db/client";
import { listDueEmails, markEmailAttemptFailed, markEmailSent } from "../db/repositories/outbox";
import type { Logger } from "../logger";
import type { MailTransport } from "./transport";

const MAX_ATTEMPTS = 8;
const POLL_MS = 2_000;

/** Backoff between tries: 5 s, 10 s, 20 s ... capped at 10 minutes. */
const retryDelayMs = (attempts: number) => Math.min(5_000 * 2 ** (attempts - 1), 600_000);

/**
 * Sends what the outbox table holds. Services only write rows (inside their transaction) and
 * call kick(); a poll picks up anything a crash or an SMTP outage left behind.
 */
export function createOutboxSender(deps: { db: Db; transport: MailTransport; from: string; logger: Logger; clock?: () => Date }) {
  const clock = deps.clock ?? (() => new Date());
  let timer: NodeJS.Timeout | null = null;
  let running: Promise<void> | null = null;
  let again = false;

  async function sendDue(): Promise<void> {
    const due = await listDueEmails(deps.db, clock(), 20);
    for (const mail of due) {
      try {
        await deps.transport.sendMail({ from: deps.from, to: mail.toAddress, subject: mail.subject, text: mail.textBody });
        await markEmailSent(deps.db, mail.id, clock());
      } catch (error) {
        const attempts = mail.attempts + 1;
        const retryAt = attempts < MAX_ATTEMPTS ? new Date(clock().getTime() + retryDelayMs(attempts)) : null;
        deps.logger.warn({ mailId: mail.id, attempts, err: error }, "e-mail delivery failed; will retry");
        await markEmailAttemptFailed(deps.db, mail.id, attempts, error instanceof Error ? error.message : String(error), retryAt);
      }
    }
  }

  /** Runs one pass; a kick during a pass schedules one more so nothing waits for the poll. */
  function flush(): Promise<void> {
    if (running) {
      again = true;
      return running;
    }
    running = (async () => {
      do {
        again = false;
        await sendDue().catch((error) => deps.logger.error({ err: error }, "outbox pass failed"));
      } while (again);
    })().finally(() => {
      running = null;
    });
    return running;
  }

  return {
    kick: () => void flush(),
    flush,
    start() {
      timer ??= setInterval(() => void flush(), POLL_MS);
      timer.unref();
    },
    async stop() {
      if (timer) clearInterval(timer);
      timer = null;
      await running;
    },
  };
}
export type OutboxSender = ReturnType<typeof createOutboxSender>;
