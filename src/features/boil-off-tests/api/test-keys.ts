/**
 * Boil-off test query keys, prefix first. A log, a window or an acceptance changes one test's
 * detail and series and the lists (their measured and ratio columns); the design choices for the
 * new-test form are separate and rarely change.
 */
export const testKeys = {
  all: ["boil-off-tests"] as const,
  lists: () => [...testKeys.all, "list"] as const,
  list: (designId?: string) => [...testKeys.lists(), { designId: designId ?? null }] as const,
  detail: (testId: string) => [...testKeys.all, "detail", testId] as const,
  series: (testId: string) => [...testKeys.detail(testId), "series"] as const,
  designChoices: () => [...testKeys.all, "design-choices"] as const,
  revision: (designId: string, revision: number) => [...testKeys.all, "revision", designId, revision] as const,
  calibration: (designId: string) => [...testKeys.all, "calibration", designId] as const,
};
