import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { CompareResultSchema } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { compareKeys } from "./compare-keys";

export const getComparison = (ids: string[], pricePerL: number | null, signal?: AbortSignal) => {
  const query = new URLSearchParams({ ids: ids.join(",") });
  if (pricePerL !== null) query.set("price_per_L", String(pricePerL));
  return apiRequest("GET", `/compare?${query.toString()}`, { schema: CompareResultSchema, signal });
};

// Comparing needs two designs at least; the previous table stays while a new price loads.
export const comparisonQueryOptions = (ids: string[], pricePerL: number | null) =>
  queryOptions({
    queryKey: compareKeys.result(ids, pricePerL),
    queryFn: ({ signal }) => getComparison(ids, pricePerL, signal),
    enabled: ids.length >= 2,
    placeholderData: keepPreviousData,
  });

export const useComparison = (ids: string[], pricePerL: number | null) => useQuery(comparisonQueryOptions(ids, pricePerL));
