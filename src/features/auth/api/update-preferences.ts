import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MeSchema, type PreferencesInput } from "../../../../shared/schemas/auth";
import { apiRequest } from "../../../lib/api-client";
import { authKeys } from "./auth-keys";

export const updatePreferences = (input: PreferencesInput) =>
  apiRequest("PATCH", "/auth/me/preferences", { body: input, schema: MeSchema });

/** The answer is the whole Me: written straight into the session query, so every screen re-renders in the new units. */
export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    onSuccess: (me) => queryClient.setQueryData(authKeys.me(), me),
  });
}
