import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { MaterialListSchema, type MaterialListQuery } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

/** The filters as a query string; the list and the CSV export share it so both show the same rows. */
export function materialsQueryString(filters: MaterialListQuery): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value) params.set(key, value);
  const text = params.toString();
  return text ? `?${text}` : "";
}

export const getMaterials = (filters: MaterialListQuery, signal?: AbortSignal) =>
  apiRequest("GET", `/materials${materialsQueryString(filters)}`, { schema: MaterialListSchema, signal });

/** A plain link, so the browser downloads the server's file with its own name. */
export const materialsExportHref = (filters: MaterialListQuery) => `/api/materials/export.csv${materialsQueryString(filters)}`;

// Approved entries rarely change, drafts do when someone else decides: 30 s is a fair middle.
// The previous rows stay on screen while a new filter loads, so the table does not flash empty.
export const materialsQueryOptions = (filters: MaterialListQuery) =>
  queryOptions({
    queryKey: libraryKeys.list(filters),
    queryFn: ({ signal }) => getMaterials(filters, signal),
    staleTime: 30_000,
    placeholderData: keepPreviousData,
  });

export const useMaterials = (filters: MaterialListQuery) => useQuery(materialsQueryOptions(filters));
