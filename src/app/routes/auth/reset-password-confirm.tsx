import { useState } from "react";
import { useSearchParams } from "react-router-dom";
import { AuthLayout } from "../../../components/layouts/auth-layout";
import { Callout } from "../../../components/ui/callout";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { ResetConfirmForm } from "../../../features/auth/components/reset-confirm-form";

/** Opened from the reset e-mail: /reset-password/confirm?token=... */
export default function ResetPasswordConfirmRoute() {
  const [search] = useSearchParams();
  const token = search.get("token") ?? "";
  const [done, setDone] = useState(false);

  return (
    <AuthLayout title="Set a new password">
      <title>Set a new password · Frostfold</title>
      {done ? (
        <div className="space-y-4">
          <Callout tone="success" title="Password changed">
            Every signed-in session for this account has ended. Sign in with your e-mail and the new password.
          </Callout>
          <TextLink to={paths.auth.signIn.getHref()}>Go to sign in</TextLink>
        </div>
      ) : token ? (
        <ResetConfirmForm token={token} onDone={() => setDone(true)} />
      ) : (
        <Callout tone="error" title="This link is incomplete">
          Open the link from the e-mail again, or <TextLink to={paths.auth.resetPassword.getHref()}>ask for a new one</TextLink>.
        </Callout>
      )}
      {!done ? (
        <p className="mt-6 text-sm">
          <TextLink to={paths.auth.resetPassword.getHref()}>Ask for a new link</TextLink>
        </p>
      ) : null}
    </AuthLayout>
  );
}
