import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { authKeys } from "../../../features/auth/api/auth-keys";
import { useMe } from "../../../features/auth/api/get-me";
import { AlertEmailSwitch } from "../../../features/auth/components/alert-email-switch";
import { outboxKeys } from "../../../features/outbox/api/outbox-keys";
import { teamQueryOptions, useTeam } from "../../../features/team/api/get-team";
import { InvitationsList } from "../../../features/team/components/invitations-list";
import { InviteForm } from "../../../features/team/components/invite-form";
import { MembersTable } from "../../../features/team/components/members-table";
import { Can, useCan } from "../../../lib/can";

// prefetchQuery never throws: if the session is gone, the shell's guard redirects instead.
export const clientLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(teamQueryOptions());
  return null;
};

export default function TeamRoute() {
  const { data: me } = useMe();
  const team = useTeam();
  const queryClient = useQueryClient();
  const canManage = useCan("manage:team");
  if (!me) return null;

  // A change to your own membership changes your session (role, or access at all).
  const refreshSessionIfSelf = (memberId: string) =>
    memberId === me.user.id ? queryClient.invalidateQueries({ queryKey: authKeys.me() }) : undefined;
  const showOutbox = me.localMail && me.permissions.includes("read:outbox");

  return (
    <>
      <title>Team · Frostfold</title>
      <PageHeader
        title="Team"
        description={canManage ? `Who works in ${me.organization.name}, and what each person may do.` : `Who works in ${me.organization.name}. Only owners change the team.`}
      />
      <div className="space-y-6">
        <Can action="manage:team">
          <Card title="Invite a member">
            <InviteForm
              onInvited={() => queryClient.invalidateQueries({ queryKey: outboxKeys.all })}
              sentNote={showOutbox ? <>Mail stays on this machine: read it in the <TextLink to={paths.app.outbox.getHref()}>Outbox</TextLink>.</> : "The link works until it expires or is revoked; see Pending invitations below."}
            />
          </Card>
        </Can>
        <Card title="Members">
          {team.error ? <ErrorMessage error={team.error} title="Could not load the team" /> : null}
          {team.isPending ? <Loading label="Loading members…" /> : null}
          {team.data ? (
            <MembersTable
              members={team.data.members}
              currentUserId={me.user.id}
              onMemberChanged={(member) => refreshSessionIfSelf(member.id)}
              onMemberRemoved={refreshSessionIfSelf}
            />
          ) : null}
        </Card>
        <Card title="Your alert e-mails">
          <AlertEmailSwitch current={me.user.alertEmails} receivesAlerts={me.permissions.includes("receive:alert-mail")} />
        </Card>
        {team.data ? (
          <Card title="Pending invitations">
            <InvitationsList invitations={team.data.invitations} />
          </Card>
        ) : null}
      </div>
    </>
  );
}
