import type { OutboxMessage } from "../../../../shared/schemas/team";
import { formatDateTime } from "../../../lib/format-time";
import { OutboxStatus } from "./outbox-status";

const anchorClass = "break-all font-mono text-sm text-frost-300 underline decoration-frost-700 underline-offset-4 hover:decoration-frost-300";

/** One caught e-mail: who it was for, what it said, and its links ready to follow. */
export function OutboxMessageCard({ message }: { message: OutboxMessage }) {
  const headingId = `outbox-${message.id}`;
  return (
    <article aria-labelledby={headingId} className="rounded-lg border border-ink-700 bg-ink-900 p-5">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h2 id={headingId} className="font-semibold text-ink-50">
            {message.subject}
          </h2>
          <p className="mt-0.5 text-sm text-ink-300">
            To <span className="text-ink-100">{message.to}</span> · queued {formatDateTime(message.createdAt)}
            {message.sentAt ? ` · sent ${formatDateTime(message.sentAt)}` : ""}
          </p>
        </div>
        <OutboxStatus message={message} />
      </header>
      {message.links.length > 0 ? (
        <div className="mt-4">
          <h3 className="text-xs font-medium uppercase tracking-wider text-ink-300">Links in this message</h3>
          <ul className="mt-1 space-y-1">
            {message.links.map((link) => (
              <li key={link}>
                <a href={link} className={anchorClass}>
                  {link}
                </a>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <div className="mt-4">
        <h3 className="text-xs font-medium uppercase tracking-wider text-ink-300">Message text</h3>
        <pre className="mt-1 max-h-64 overflow-auto whitespace-pre-wrap break-words rounded-md bg-ink-950 p-3 font-mono text-xs text-ink-200">{message.text}</pre>
      </div>
    </article>
  );
}
