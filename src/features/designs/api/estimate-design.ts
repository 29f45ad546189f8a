import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { EstimateResultSchema, type DesignContent } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const estimateDesign = (content: DesignContent, sweep: boolean, signal?: AbortSignal) =>
  apiRequest("POST", "/estimate", { body: { content, sweep }, schema: EstimateResultSchema, signal });

/**
 * The live preview. Keyed by the content's JSON: the same design is never asked twice, and an
 * estimate never goes stale (it depends on nothing else but the library's fixed versions).
 * A 400 is an answer about the design, so it is not retried. With sweep false the answer leaves
 * the layer-count sweep out: the quick figures an edit repaints first.
 */
export function useEstimate(contentKey: string | null, sweep: boolean) {
  return useQuery({
    queryKey: designKeys.estimate(contentKey ?? "", sweep),
    queryFn: ({ signal }) => estimateDesign(JSON.parse(contentKey as string) as DesignContent, sweep, signal),
    enabled: contentKey !== null,
    staleTime: Number.POSITIVE_INFINITY,
    gcTime: 60_000,
    retry: false,
    placeholderData: keepPreviousData,
  });
}
