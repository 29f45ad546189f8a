import { queryOptions, useQuery } from "@tanstack/react-query";
import { RevisionDetailSchema } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const getRevision = (designId: string, revision: number, signal?: AbortSignal) =>
  apiRequest("GET", `/designs/${encodeURIComponent(designId)}/revisions/${revision}`, { schema: RevisionDetailSchema, signal });

// A revision is an immutable snapshot: once loaded it never changes.
export const revisionQueryOptions = (designId: string, revision: number) =>
  queryOptions({
    queryKey: designKeys.revision(designId, revision),
    queryFn: ({ signal }) => getRevision(designId, revision, signal),
    staleTime: Number.POSITIVE_INFINITY,
  });

export const useRevision = (designId: string, revision: number | null) =>
  useQuery({ ...revisionQueryOptions(designId, revision ?? 0), enabled: revision !== null });
