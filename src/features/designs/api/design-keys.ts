/**
 * Design query keys, prefix first. A save invalidates that design's detail and the lists, never
 * the estimates (keyed by content, so they never go stale) or the library picks.
 */
export const designKeys = {
  all: ["designs"] as const,
  lists: () => [...designKeys.all, "list"] as const,
  list: (q: string) => [...designKeys.lists(), { q }] as const,
  detail: (designId: string) => [...designKeys.all, "detail", designId] as const,
  revision: (designId: string, revision: number) => [...designKeys.detail(designId), "revision", revision] as const,
  /** contentKey is the JSON of a valid DesignContent: equal designs share one estimate. */
  estimate: (contentKey: string, sweep: boolean) => [...designKeys.all, "estimate", sweep ? "with-sweep" : "figures", contentKey] as const,
  libraryPicks: () => [...designKeys.all, "library-picks"] as const,
};
