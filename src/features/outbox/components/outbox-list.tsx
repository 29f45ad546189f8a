import type { OutboxMessage } from "../../../../shared/schemas/team";
import { OutboxMessageCard } from "./outbox-message-card";

/** Newest first, whatever order the server used, so the mail just triggered is on top. */
export function OutboxList({ messages }: { messages: OutboxMessage[] }) {
  if (messages.length === 0) {
    return <p className="text-sm text-ink-300">No mail has been caught yet. Invite someone or request a password reset to see one here.</p>;
  }
  const newestFirst = [...messages].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  return (
    <div className="space-y-4">
      {newestFirst.map((message) => (
        <OutboxMessageCard key={message.id} message={message} />
      ))}
    </div>
  );
}
