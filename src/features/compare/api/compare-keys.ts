/** Compare query keys: one comparison per picked set and price. */
export const compareKeys = {
  all: ["compare"] as const,
  result: (ids: string[], pricePerL: number | null) => [...compareKeys.all, { ids, pricePerL }] as const,
};
