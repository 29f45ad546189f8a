import { queryOptions, useQuery } from "@tanstack/react-query";
import { OutboxSchema } from "../../../../shared/schemas/team";
import { apiRequest } from "../../../lib/api-client";
import { outboxKeys } from "./outbox-keys";

export const getOutbox = (signal?: AbortSignal) => apiRequest("GET", "/outbox", { schema: OutboxSchema, signal });

// Mail is handed to the SMTP fake a moment after the action that queued it: while any message
// is still pending, look again every two seconds so its status settles on screen by itself.
export const outboxQueryOptions = () =>
  queryOptions({
    queryKey: outboxKeys.messages(),
    queryFn: ({ signal }) => getOutbox(signal),
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.messages.some((m) => m.status === "pending") ? 2_000 : false),
  });

export const useOutbox = () => useQuery(outboxQueryOptions());
