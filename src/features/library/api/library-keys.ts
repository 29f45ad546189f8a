import type { MaterialListQuery } from "../../../../shared/schemas/material";

/**
 * Library query keys, prefix first. A change to an entry invalidates ["library", "materials"]
 * (every list and that detail); approving or retiring also reaches ["library", "cryogens"],
 * since the cryogen list is built from approved entries.
 */
export const libraryKeys = {
  all: ["library"] as const,
  materials: () => [...libraryKeys.all, "materials"] as const,
  list: (filters: MaterialListQuery) => [...libraryKeys.materials(), "list", filters] as const,
  detail: (id: string) => [...libraryKeys.materials(), "detail", id] as const,
  cryogens: () => [...libraryKeys.all, "cryogens"] as const,
};
