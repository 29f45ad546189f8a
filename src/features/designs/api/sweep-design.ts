import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { SweepResultSchema, type DesignContent, type SweepVariable } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const sweepDesign = (content: DesignContent, variable: SweepVariable, signal?: AbortSignal) =>
  apiRequest("POST", "/estimate/sweep", { body: { content, variable }, schema: SweepResultSchema, signal });

/** Under the estimates' prefix: keyed by the variable and the content's JSON, so it never goes stale. */
export const sweepKey = (contentKey: string, variable: SweepVariable) => [...designKeys.all, "estimate", "sweep", variable, contentKey] as const;

/**
 * Heat against layer density, warm temperature or pressure over the range the server picks from
 * the design. Only a valid design is asked (contentKey null asks nothing); the previous chart
 * stays while the next loads; a 400 is an answer about the design, so it is not retried.
 */
export function useSweep(contentKey: string | null, variable: SweepVariable) {
  return useQuery({
    queryKey: sweepKey(contentKey ?? "", variable),
    queryFn: ({ signal }) => sweepDesign(JSON.parse(contentKey as string) as DesignContent, variable, signal),
    enabled: contentKey !== null,
    staleTime: Number.POSITIVE_INFINITY,
    gcTime: 60_000,
    retry: false,
    placeholderData: keepPreviousData,
  });
}
