import { queryOptions, useQuery } from "@tanstack/react-query";
import { MeSchema, type Me } from "../../../../shared/schemas/auth";
import { apiRequest, isApiError } from "../../../lib/api-client";
import { authKeys } from "./auth-keys";

/** Signed out is an answer, not a failure: a 401 becomes null so the guard can redirect. */
export async function getMe({ signal }: { signal?: AbortSignal } = {}): Promise<Me | null> {
  try {
    return await apiRequest("GET", "/auth/me", { schema: MeSchema, signal });
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

// The session changes only through sign-in, sign-out and role changes, which all write this key.
export const meQueryOptions = () =>
  queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 5 * 60_000 });

export const useMe = () => useQuery(meQueryOptions());
