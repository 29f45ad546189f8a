import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { DesignListSchema } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const getDesigns = (q: string, signal?: AbortSignal) =>
  apiRequest("GET", `/designs${q ? `?q=${encodeURIComponent(q)}` : ""}`, { schema: DesignListSchema, signal });

// The search is the server's (q); the previous list stays on screen while the next one loads.
export const designsQueryOptions = (q = "") =>
  queryOptions({ queryKey: designKeys.list(q), queryFn: ({ signal }) => getDesigns(q, signal), placeholderData: keepPreviousData });

export const useDesigns = (q = "") => useQuery(designsQueryOptions(q));
