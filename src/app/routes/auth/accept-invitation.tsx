import { useNavigate, useSearchParams } from "react-router-dom";
import { AuthLayout } from "../../../components/layouts/auth-layout";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Callout } from "../../../components/ui/callout";
import { Loading } from "../../../components/ui/spinner";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { useInvitation } from "../../../features/auth/api/get-invitation";
import { AcceptInvitationForm } from "../../../features/auth/components/accept-invitation-form";
import { isApiError } from "../../../lib/api-client";

const ROLE_WORDS = { owner: "an owner", engineer: "an engineer", technician: "a technician", viewer: "a viewer" } as const;

/** Opened from the invitation e-mail: /invitations/accept?token=... */
export default function AcceptInvitationRoute() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const token = search.get("token") ?? "";
  const invitation = useInvitation(token);

  const body = () => {
    // A malformed token fails validation (400) before the lookup; both mean the same to the invitee.
    if (!token || (isApiError(invitation.error) && (invitation.error.status === 400 || invitation.error.status === 404))) {
      return (
        <Callout tone="error" title="This invitation link does not work">
          It may have expired, been revoked or been used already. Ask the person who invited you to send a new one.
        </Callout>
      );
    }
    if (invitation.error) return <ErrorMessage error={invitation.error} title="Could not open the invitation" />;
    if (!invitation.data) return <Loading label="Opening the invitation…" />;
    const { organizationName, role } = invitation.data;
    return (
      <>
        <p className="mb-5 text-sm text-ink-200">
          You are invited to join <strong className="text-ink-50">{organizationName}</strong> as {ROLE_WORDS[role]}. Choose your name and a
          password to finish.
        </p>
        <AcceptInvitationForm token={token} invitation={invitation.data} onAccepted={() => navigate(paths.app.overview.getHref(), { replace: true })} />
      </>
    );
  };

  return (
    <AuthLayout title="Join your team on Frostfold">
      <title>Accept invitation · Frostfold</title>
      {body()}
      <p className="mt-6 text-sm text-ink-300">
        Already have an account? <TextLink to={paths.auth.signIn.getHref()}>Sign in</TextLink>
      </p>
    </AuthLayout>
  );
}
