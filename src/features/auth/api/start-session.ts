import type { QueryClient } from "@tanstack/react-query";
import type { Me } from "../../../../shared/schemas/auth";
import { authKeys } from "./auth-keys";

/**
 * A new session in this browser: drop every other feature's cached data (it may belong to the
 * previous user), then write the new Me so the guard lets the user in at once. Auth's own
 * entries stay: removing the invitation preview mid-accept would refetch a now-used token.
 */
export function startSession(queryClient: QueryClient, me: Me) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
  queryClient.setQueryData(authKeys.me(), me);
}
