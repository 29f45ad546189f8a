import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { PasswordResetConfirmSchema } from "../../../../shared/schemas/auth";
import { PASSWORD_MIN_LENGTH } from "../../../../shared/schemas/common";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { TextField } from "../../../components/ui/field";
import { isApiError } from "../../../lib/api-client";
import { applyServerErrors } from "../../../lib/form-errors";
import { useConfirmPasswordReset } from "../api/confirm-password-reset";

// The token travels in a hidden field so the one shared schema validates the whole request.
type Values = z.input<typeof PasswordResetConfirmSchema>;

export function ResetConfirmForm({ token, onDone }: { token: string; onDone: () => void }) {
  const confirm = useConfirmPasswordReset();
  const [formError, setFormError] = useState<{ title: string; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof PasswordResetConfirmSchema>>({
    resolver: zodResolver(PasswordResetConfirmSchema),
    defaultValues: { token, password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await confirm.mutateAsync(values);
      onDone();
    } catch (error) {
      const text = applyServerErrors(error, setError, ["password"]);
      if (!text) return;
      const expired = isApiError(error, "invalid_token");
      setFormError({ title: expired ? "This link no longer works" : "Could not set the password", text });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Callout tone="error" title={formError.title}>{formError.text}</Callout> : null}
      {formState.errors.token ? <Callout tone="error" title="This link is incomplete">{formState.errors.token.message}</Callout> : null}
      <input type="hidden" {...register("token")} />
      <TextField label="New password" type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN_LENGTH} characters.`} error={formState.errors.password?.message} {...register("password")} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>
        Set new password
      </Button>
    </form>
  );
}
