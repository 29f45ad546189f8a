import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { SignUpInputSchema, type Me } from "../../../../shared/schemas/auth";
import { PASSWORD_MIN_LENGTH } from "../../../../shared/schemas/common";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { TextField } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useSignUp } from "../api/sign-up";

type Values = z.input<typeof SignUpInputSchema>;

/** Creates an organization with its first owner, who is signed in on success. */
export function CreateAccountForm({ onCreated }: { onCreated: (me: Me) => void }) {
  const signUp = useSignUp();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof SignUpInputSchema>>({
    resolver: zodResolver(SignUpInputSchema),
    defaultValues: { name: "", email: "", organizationName: "", password: "" },
  });
  const errors = formState.errors;

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onCreated(await signUp.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["name", "email", "organizationName", "password"], { email_taken: "email" }));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Callout tone="error" title="Could not create the account">{formError}</Callout> : null}
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...register("name")} />
      <TextField label="Work e-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <TextField label="Organization" autoComplete="organization" hint="The company or site your team plans for." error={errors.organizationName?.message} {...register("organizationName")} />
      <TextField label="Password" type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN_LENGTH} characters.`} error={errors.password?.message} {...register("password")} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>
        Create account
      </Button>
    </form>
  );
}
