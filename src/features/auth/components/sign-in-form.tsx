import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { SignInInputSchema, type Me } from "../../../../shared/schemas/auth";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { TextField } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { isApiError } from "../../../lib/api-client";
import { useSignIn } from "../api/sign-in";

type Values = z.input<typeof SignInInputSchema>;

export function SignInForm({ onSignedIn }: { onSignedIn: (me: Me) => void }) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState<{ title: string; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof SignInInputSchema>>({
    resolver: zodResolver(SignInInputSchema),
    defaultValues: { email: "", password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onSignedIn(await signIn.mutateAsync(values));
    } catch (error) {
      const text = applyServerErrors(error, setError, ["email", "password"]);
      if (!text) return;
      // Wrong e-mail and wrong password read the same, on purpose: the server does not say which.
      const title = isApiError(error, "rate_limited") ? "Too many attempts" : isApiError(error, "invalid_credentials") ? "Sign-in failed" : "Could not sign in";
      setFormError({ title, text });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Callout tone="error" title={formError.title}>{formError.text}</Callout> : null}
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <TextField label="Password" type="password" autoComplete="current-password" error={formState.errors.password?.message} {...register("password")} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>
        Sign in
      </Button>
    </form>
  );
}
