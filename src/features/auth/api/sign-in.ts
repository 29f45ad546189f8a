import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MeSchema, type SignInInput } from "../../../../shared/schemas/auth";
import { apiRequest } from "../../../lib/api-client";
import { startSession } from "./start-session";

export const signIn = (input: SignInInput) => apiRequest("POST", "/auth/sign-in", { body: input, schema: MeSchema });

/** The answer is the new Me: write it into the cache so the guard lets the user in at once. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => startSession(queryClient, me),
  });
}
