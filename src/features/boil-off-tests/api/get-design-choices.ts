import { queryOptions, useQuery } from "@tanstack/react-query";
import { DesignDetailSchema, DesignListSchema, RevisionDetailSchema } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

/**
 * What the new-test form picks from: the designs, one design's revisions, and the stages of
 * the picked revision's prediction. Read here through the designs API rather than from the
 * designs feature, which this feature never imports.
 */
export const designChoicesQueryOptions = () =>
  queryOptions({ queryKey: testKeys.designChoices(), queryFn: ({ signal }) => apiRequest("GET", "/designs", { schema: DesignListSchema, signal }) });

export const useDesignChoices = () => useQuery(designChoicesQueryOptions());

export const useDesignRevisions = (designId: string | null) =>
  useQuery({
    queryKey: [...testKeys.designChoices(), designId],
    queryFn: ({ signal }) => apiRequest("GET", `/designs/${encodeURIComponent(designId ?? "")}`, { schema: DesignDetailSchema, signal }),
    enabled: Boolean(designId),
  });

// A revision is an immutable snapshot: once loaded it never changes.
export const useRevisionStages = (designId: string | null, revision: number | null) =>
  useQuery({
    queryKey: testKeys.revision(designId ?? "", revision ?? 0),
    queryFn: ({ signal }) => apiRequest("GET", `/designs/${encodeURIComponent(designId ?? "")}/revisions/${revision}`, { schema: RevisionDetailSchema, signal }),
    enabled: Boolean(designId) && revision !== null && revision > 0,
    staleTime: Number.POSITIVE_INFINITY,
    select: (r) => r.prediction.result.stages.map((s, index) => ({ index, label: s.label, net_W: s.net_W, hasCryogen: s.boilOff !== undefined })),
  });
