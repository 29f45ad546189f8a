import { zodResolver } from "@hookform/resolvers/zod";
import { useState, type ReactNode } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { ROLES } from "../../../../shared/permissions";
import { InviteInputSchema } from "../../../../shared/schemas/team";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { SelectField, TextField } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useInviteMember } from "../api/invite-member";
import { ROLE_LABELS, ROLE_SUMMARIES } from "./role-text";

type Values = z.input<typeof InviteInputSchema>;

/** sentNote lets the route add where the mail can be read (the local outbox), if anywhere. */
export function InviteForm({ onInvited, sentNote }: { onInvited?: () => unknown; sentNote?: ReactNode }) {
  const invite = useInviteMember({ onInvited });
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  // Least privilege by default: an invitee starts as a viewer unless the owner picks more.
  const { register, handleSubmit, setError, reset, control, formState } = useForm<Values, unknown, z.output<typeof InviteInputSchema>>({
    resolver: zodResolver(InviteInputSchema),
    defaultValues: { email: "", role: "viewer" },
  });
  const role = useWatch({ control, name: "role" });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSentTo(null);
    try {
      await invite.mutateAsync(values);
      setSentTo(values.email);
      reset({ email: "", role: values.role });
    } catch (error) {
      // "Already a member" is about the address, so it belongs beside the e-mail field.
      setFormError(applyServerErrors(error, setError, ["email", "role"], { already_member: "email" }));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Invite a member">
      {formError ? <Callout tone="error" title="Could not send the invitation">{formError}</Callout> : null}
      {sentTo ? (
        <Callout tone="success" title={`Invitation sent to ${sentTo}`}>
          {sentNote}
        </Callout>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <TextField label="E-mail to invite" type="email" autoComplete="off" error={formState.errors.email?.message} {...register("email")} />
        <SelectField label="Role" error={formState.errors.role?.message} hint={ROLE_SUMMARIES[role]} {...register("role")}>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </SelectField>
      </div>
      <Button type="submit" busy={formState.isSubmitting}>
        Send invitation
      </Button>
    </form>
  );
}
