import { queryOptions, useQuery } from "@tanstack/react-query";
import { CryogenListSchema } from "../../../../shared/schemas/cryogen";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

export const getCryogens = (signal?: AbortSignal) => apiRequest("GET", "/cryogens", { schema: CryogenListSchema, signal });

// Fluid data changes only when an owner approves a cryogen entry, which invalidates this key.
export const cryogensQueryOptions = () =>
  queryOptions({ queryKey: libraryKeys.cryogens(), queryFn: ({ signal }) => getCryogens(signal), staleTime: 5 * 60_000 });

export const useCryogens = () => useQuery(cryogensQueryOptions());
