import { AuthLayout } from "../../../components/layouts/auth-layout";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { ResetRequestForm } from "../../../features/auth/components/reset-request-form";

export default function ResetPasswordRoute() {
  return (
    <AuthLayout title="Reset your password" intro="Enter the e-mail you sign in with. We will send a link to set a new password.">
      <title>Reset password · Frostfold</title>
      <ResetRequestForm />
      <p className="mt-6 text-sm">
        <TextLink to={paths.auth.signIn.getHref()}>Back to sign in</TextLink>
      </p>
    </AuthLayout>
  );
}
