import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { PasswordResetRequestSchema } from "../../../../shared/schemas/auth";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { TextField } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useRequestPasswordReset } from "../api/request-password-reset";

type Values = z.input<typeof PasswordResetRequestSchema>;

export function ResetRequestForm() {
  const request = useRequestPasswordReset();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof PasswordResetRequestSchema>>({
    resolver: zodResolver(PasswordResetRequestSchema),
    defaultValues: { email: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await request.mutateAsync(values);
      setSentTo(values.email);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["email"]));
    }
  });

  // Same words whether or not the address has an account: the page must not reveal which.
  if (sentTo) {
    return (
      <Callout tone="success" title="Check your e-mail">
        If {sentTo} belongs to a Frostfold account, a link to set a new password is on its way. The link works once.
      </Callout>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Callout tone="error" title="Could not send the link">{formError}</Callout> : null}
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>
        Send reset link
      </Button>
    </form>
  );
}
