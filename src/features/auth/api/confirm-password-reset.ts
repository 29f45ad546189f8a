import { useMutation } from "@tanstack/react-query";
import { z } from "zod";
import type { PasswordResetConfirm } from "../../../../shared/schemas/auth";
import { apiRequest } from "../../../lib/api-client";

const OkSchema = z.object({ ok: z.literal(true) });

export const confirmPasswordReset = (input: PasswordResetConfirm) =>
  apiRequest("POST", "/auth/password-reset/confirm", { body: input, schema: OkSchema });

export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
