import { queryOptions, useQuery } from "@tanstack/react-query";
import { DesignDetailSchema } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const getDesign = (designId: string, signal?: AbortSignal) =>
  apiRequest("GET", `/designs/${encodeURIComponent(designId)}`, { schema: DesignDetailSchema, signal });

// Stale at once: colleagues save revisions from other browsers, and each visit should see them.
export const designQueryOptions = (designId: string) =>
  queryOptions({ queryKey: designKeys.detail(designId), queryFn: ({ signal }) => getDesign(designId, signal), staleTime: 0 });

export const useDesign = (designId: string) => useQuery(designQueryOptions(designId));
