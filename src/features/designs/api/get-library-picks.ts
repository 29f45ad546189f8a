import { queryOptions, useQuery } from "@tanstack/react-query";
import { MaterialListSchema, type MaterialKind, type MaterialSummary } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export type LibraryPicks = Record<MaterialKind, MaterialSummary[]>;

const EMPTY = (): LibraryPicks => ({ reflector: [], spacer: [], "wall-finish": [], "support-material": [], "correlation-set": [], cryogen: [] });

/** Every approved library entry a design may pick, grouped by kind, in one request. */
export async function getLibraryPicks(signal?: AbortSignal): Promise<LibraryPicks> {
  const { materials } = await apiRequest("GET", "/materials?status=approved", { schema: MaterialListSchema, signal });
  const picks = EMPTY();
  for (const m of materials) if (m.pickable && m.currentVersion !== null) picks[m.kind].push(m);
  for (const list of Object.values(picks)) list.sort((a, b) => a.name.localeCompare(b.name));
  return picks;
}

// Approved versions never change and new approvals are rare: five minutes is fresh enough.
export const libraryPicksQueryOptions = () =>
  queryOptions({ queryKey: designKeys.libraryPicks(), queryFn: ({ signal }) => getLibraryPicks(signal), staleTime: 5 * 60_000 });

export const useLibraryPicks = () => useQuery(libraryPicksQueryOptions());
