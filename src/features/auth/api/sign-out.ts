import { useMutation } from "@tanstack/react-query";
import { apiRequest } from "../../../lib/api-client";

export const signOut = () => apiRequest("POST", "/auth/sign-out");

/**
 * The caller clears the cache after it has left the signed-in screens; clearing first would
 * make the guard bounce to /sign-in?next=... before the caller's own navigation.
 */
export function useSignOut() {
  return useMutation({ mutationFn: signOut });
}
