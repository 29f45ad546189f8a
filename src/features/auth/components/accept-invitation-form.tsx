import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import type { Me } from "../../../../shared/schemas/auth";
import { AcceptInvitationInputSchema } from "../../../../shared/schemas/team";
import { PASSWORD_MIN_LENGTH } from "../../../../shared/schemas/common";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { TextField } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useAcceptInvitation } from "../api/accept-invitation";
import type { InvitationPreview } from "../api/get-invitation";

type Values = z.input<typeof AcceptInvitationInputSchema>;

export function AcceptInvitationForm({ token, invitation, onAccepted }: { token: string; invitation: InvitationPreview; onAccepted: (me: Me) => void }) {
  const accept = useAcceptInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values, unknown, z.output<typeof AcceptInvitationInputSchema>>({
    resolver: zodResolver(AcceptInvitationInputSchema),
    defaultValues: { token, name: "", password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onAccepted(await accept.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ["name", "password"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Callout tone="error" title="Could not join">{formError}</Callout> : null}
      <input type="hidden" {...register("token")} />
      <div className="space-y-1.5">
        <p className="text-sm font-medium text-ink-100">E-mail</p>
        <p className="rounded-md border border-ink-700 bg-ink-950 px-3 py-2 text-ink-200">{invitation.email}</p>
      </div>
      <TextField label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <TextField label="Password" type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN_LENGTH} characters.`} error={formState.errors.password?.message} {...register("password")} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>
        Join {invitation.organizationName}
      </Button>
    </form>
  );
}
