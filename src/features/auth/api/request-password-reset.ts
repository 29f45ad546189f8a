import { useMutation } from "@tanstack/react-query";
import type { PasswordResetRequest } from "../../../../shared/schemas/auth";
import { apiRequest } from "../../../lib/api-client";

// The server answers 202 whether or not the address has an account, so nobody can probe for one.
export const requestPasswordReset = (input: PasswordResetRequest) =>
  apiRequest("POST", "/auth/password-reset", { body: input });

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
