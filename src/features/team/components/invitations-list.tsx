import type { Invitation } from "../../../../shared/schemas/team";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { useCan } from "../../../lib/can";
import { formatDateTime } from "../../../lib/format-time";
import { useRevokeInvitation } from "../api/revoke-invitation";
import { ROLE_LABELS } from "./role-text";

/** Invitations not yet accepted; owners may revoke one so its link stops working. */
export function InvitationsList({ invitations }: { invitations: Invitation[] }) {
  const canManage = useCan("manage:team");
  const revoke = useRevokeInvitation();

  if (invitations.length === 0) return <p className="text-sm text-ink-300">No invitations are waiting.</p>;
  return (
    <ul className="divide-y divide-ink-800" aria-label="Pending invitations">
      {invitations.map((invitation) => (
        <li key={invitation.id} className="flex flex-wrap items-center justify-between gap-3 py-3 text-sm">
          <div>
            <p className="font-medium text-ink-50">{invitation.email}</p>
            <p className="text-ink-300">
              {ROLE_LABELS[invitation.role]} · invited by {invitation.invitedBy} · expires {formatDateTime(invitation.expiresAt)}
            </p>
          </div>
          {canManage ? (
            <ConfirmButton
              label="Revoke"
              triggerLabel={`Revoke invitation for ${invitation.email}`}
              title="Revoke this invitation?"
              description={<p>The link sent to {invitation.email} stops working. You can send a new invitation later.</p>}
              confirmLabel="Revoke invitation"
              onConfirm={() => revoke.mutateAsync(invitation.id)}
            />
          ) : null}
        </li>
      ))}
    </ul>
  );
}
