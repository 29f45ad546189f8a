import { useNavigate, useSearchParams } from "react-router-dom";
import { AuthLayout } from "../../../components/layouts/auth-layout";
import { TextLink } from "../../../components/ui/text-link";
import { paths, safeNext } from "../../../config/paths";
import { SignInForm } from "../../../features/auth/components/sign-in-form";

export default function SignInRoute() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const next = safeNext(search.get("next"));

  return (
    <AuthLayout title="Sign in to Frostfold" intro="Plan heat leak, boil-off and hold time with your team.">
      <title>Sign in · Frostfold</title>
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
      <div className="mt-6 flex flex-wrap justify-between gap-3 text-sm">
        <TextLink to={paths.auth.resetPassword.getHref()}>Forgot your password?</TextLink>
        <TextLink to={paths.auth.createAccount.getHref()}>Create an account</TextLink>
      </div>
    </AuthLayout>
  );
}
