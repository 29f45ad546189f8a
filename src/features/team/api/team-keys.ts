/** Team query keys, prefix first: every team mutation invalidates ["team"], nothing wider. */
export const teamKeys = {
  all: ["team"] as const,
  overview: () => [...teamKeys.all, "members-and-invitations"] as const,
};
