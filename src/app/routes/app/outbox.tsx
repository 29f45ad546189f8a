import type { QueryClient } from "@tanstack/react-query";
import { can } from "../../../../shared/permissions";
import type { Me } from "../../../../shared/schemas/auth";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Callout } from "../../../components/ui/callout";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { meQueryOptions, useMe } from "../../../features/auth/api/get-me";
import { outboxQueryOptions, useOutbox } from "../../../features/outbox/api/get-outbox";
import { OutboxList } from "../../../features/outbox/components/outbox-list";

const mayReadOutbox = (me: Me | null | undefined) => Boolean(me && me.localMail && can(me.role, "read:outbox"));

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (mayReadOutbox(me)) await queryClient.prefetchQuery(outboxQueryOptions());
  return null;
};

function Messages() {
  const outbox = useOutbox();
  if (outbox.error) return <ErrorMessage error={outbox.error} title="Could not load the outbox" />;
  if (!outbox.data) return <Loading label="Loading caught mail…" />;
  return <OutboxList messages={outbox.data.messages} />;
}

export default function OutboxRoute() {
  const { data: me } = useMe();
  return (
    <>
      <title>Outbox · Frostfold</title>
      <PageHeader title="Outbox" />
      {!me?.localMail ? (
        <Callout tone="info" title="No local outbox here">
          This installation sends mail through a real mail service, so there is nothing to read on this page.
        </Callout>
      ) : !mayReadOutbox(me) ? (
        <Callout tone="info" title="Owners only">
          Caught mail holds sign-in and invitation links, so only owners can read it.
        </Callout>
      ) : (
        <div className="space-y-6">
          <Callout tone="info" title="Mail stays on this machine">
            This copy of Frostfold hands its e-mail to a local stand-in mail server instead of delivering it. Every message it caught is
            listed here, so invitations and password resets can be followed without a real inbox. Links here sign people in: treat them
            like passwords.
          </Callout>
          <Messages />
        </div>
      )}
    </>
  );
}
