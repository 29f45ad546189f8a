import { queryOptions, useQuery } from "@tanstack/react-query";
import { MaterialDetailSchema } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

export const getMaterial = (id: string, signal?: AbortSignal) =>
  apiRequest("GET", `/materials/${encodeURIComponent(id)}`, { schema: MaterialDetailSchema, signal });

// An entry's status is decided by someone else (an owner, elsewhere), so look again on each visit.
export const materialQueryOptions = (id: string) =>
  queryOptions({ queryKey: libraryKeys.detail(id), queryFn: ({ signal }) => getMaterial(id, signal), staleTime: 0 });

export const useMaterial = (id: string) => useQuery(materialQueryOptions(id));
