import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MeSchema, type SignUpInput } from "../../../../shared/schemas/auth";
import { apiRequest } from "../../../lib/api-client";
import { startSession } from "./start-session";

export const signUp = (input: SignUpInput) => apiRequest("POST", "/auth/sign-up", { body: input, schema: MeSchema });

/** A new account is signed in straight away (201 Me). */
export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (me) => startSession(queryClient, me),
  });
}
