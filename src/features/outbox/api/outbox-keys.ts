/** Outbox query keys, prefix first. */
export const outboxKeys = {
  all: ["outbox"] as const,
  messages: () => [...outboxKeys.all, "messages"] as const,
};
