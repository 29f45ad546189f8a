import { useId } from "react";
import { ROLES, type Role } from "../../../../shared/permissions";
import type { Member } from "../../../../shared/schemas/team";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { ErrorIcon } from "../../../components/ui/icons";
import { formatDateTime } from "../../../lib/format-time";
import { useChangeRole } from "../api/change-role";
import { useRemoveMember } from "../api/remove-member";
import { ROLE_LABELS } from "./role-text";

type MemberRowProps = {
  member: Member;
  isSelf: boolean;
  canManage: boolean;
  onChanged?: (member: Member) => unknown;
  onRemoved?: (memberId: string) => unknown;
};

/** One member; owners get a role picker and a remove button, each with its own error line. */
export function MemberRow({ member, isSelf, canManage, onChanged, onRemoved }: MemberRowProps) {
  const change = useChangeRole({ onChanged });
  const remove = useRemoveMember({ onRemoved });
  const errorId = useId();
  // Show the picked role while the server decides; on refusal it falls back to the saved one.
  const shownRole = change.isPending ? change.variables.role : member.role;

  return (
    <tr className="border-t border-ink-800 align-top">
      <th scope="row" className="py-3 pr-4 text-left font-medium text-ink-50">
        {member.name}
        {isSelf ? " " : null}
        {isSelf ? <span className="ml-1 text-xs font-normal text-ink-300">(you)</span> : null}
      </th>
      <td className="py-3 pr-4 text-ink-200">{member.email}</td>
      <td className="py-3 pr-4">
        {canManage ? (
          <>
            <select
              aria-label={`Role for ${member.name}`}
              aria-describedby={change.error ? errorId : undefined}
              aria-invalid={change.error ? true : undefined}
              className="rounded-md border border-ink-600 bg-ink-900 px-2 py-1 text-sm text-ink-50 aria-[invalid=true]:border-fault-400"
              value={shownRole}
              disabled={change.isPending}
              onChange={(event) => change.mutate({ memberId: member.id, role: event.target.value as Role })}
            >
              {ROLES.map((role) => (
                <option key={role} value={role}>
                  {ROLE_LABELS[role]}
                </option>
              ))}
            </select>
            {change.error ? (
              <p id={errorId} role="alert" className="mt-1 flex max-w-56 items-start gap-1 text-xs text-fault-300">
                <ErrorIcon className="mt-px size-3.5" />
                <span>{change.error.message}</span>
              </p>
            ) : null}
          </>
        ) : (
          <span className="text-ink-100">{ROLE_LABELS[member.role]}</span>
        )}
      </td>
      <td className="py-3 pr-4 text-sm text-ink-300">{formatDateTime(member.joinedAt)}</td>
      {canManage ? (
        <td className="py-3 text-right">
          <ConfirmButton
            label="Remove"
            triggerLabel={`Remove ${member.name}`}
            title={`Remove ${member.name}?`}
            description={
              <p>
                {member.name} ({member.email}) loses access to this organization at once. Their past work stays. You can invite them
                again later.
              </p>
            }
            confirmLabel="Remove member"
            onConfirm={() => remove.mutateAsync(member.id)}
          />
        </td>
      ) : null}
    </tr>
  );
}
