import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { SweepResultSchema, type DesignContent, type SweepVariable } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const sweepDesign = (content: DesignContent, variable: SweepVariable, blockIndex?: number, signal?: AbortSignal) =>
  apiRequest("POST", "/estimate/sweep", { body: { content, variable, blockIndex }, schema: SweepResultSchema, signal });

/** Under the estimates' prefix: keyed by the variable, the block and the content's JSON, so it never goes stale. */
export const sweepKey = (contentKey: string, variable: SweepVariable, blockIndex?: number) =>
  [...designKeys.all, "estimate", "sweep", variable, blockIndex ?? "default", contentKey] as const;

/**
 * Heat against layer density, warm temperature or pressure over the range the server picks from
 * the design; for layer density, of the block at `blockIndex` (the server's choice without it). Only a valid design is asked (contentKey null asks nothing); the previous chart
 * stays while the next loads; a 400 is an answer about the design, so it is not retried.
 */
export function useSweep(contentKey: string | null, variable: SweepVariable, blockIndex?: number) {
  return useQuery({
    queryKey: sweepKey(contentKey ?? "", variable, blockIndex),
    queryFn: ({ signal }) => sweepDesign(JSON.parse(contentKey as string) as DesignContent, variable, blockIndex, signal),
    enabled: contentKey !== null,
    staleTime: Number.POSITIVE_INFINITY,
    gcTime: 60_000,
    retry: false,
    placeholderData: keepPreviousData,
  });
}
