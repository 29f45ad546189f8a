import type { OutboxMessage } from "../../../../shared/schemas/team";
import { Badge } from "../../../components/ui/badge";
import { ErrorIcon, PendingIcon, SuccessIcon } from "../../../components/ui/icons";

const LOOK = {
  sent: { tone: "moss", Icon: SuccessIcon, word: "Sent" },
  pending: { tone: "ember", Icon: PendingIcon, word: "Pending" },
  failed: { tone: "fault", Icon: ErrorIcon, word: "Failed" },
} as const;

/** Delivery status as a word and an icon; the colour only repeats what they say. */
export function OutboxStatus({ message }: { message: OutboxMessage }) {
  const { tone, Icon, word } = LOOK[message.status];
  const tries = message.status === "failed" && message.attempts > 0 ? ` after ${message.attempts} attempts` : "";
  return (
    <Badge tone={tone}>
      <Icon className="size-3.5" />
      {word}
      {tries}
    </Badge>
  );
}
