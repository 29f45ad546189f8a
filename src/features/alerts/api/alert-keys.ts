/** Alert query keys, prefix first; the threshold is its own key (it changes rarely, alone). */
export const alertKeys = {
  all: ["alerts"] as const,
  open: () => [...alertKeys.all, "open"] as const,
  settings: () => [...alertKeys.all, "settings"] as const,
};
