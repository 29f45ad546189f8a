import { useNavigate } from "react-router-dom";
import { AuthLayout } from "../../../components/layouts/auth-layout";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { CreateAccountForm } from "../../../features/auth/components/create-account-form";

export default function CreateAccountRoute() {
  const navigate = useNavigate();
  return (
    <AuthLayout
      title="Create a Frostfold account"
      intro="This starts a new organization with you as its owner. Joining a team that already uses Frostfold? Ask its owner for an invitation instead."
    >
      <title>Create account · Frostfold</title>
      <CreateAccountForm onCreated={() => navigate(paths.app.overview.getHref(), { replace: true })} />
      <p className="mt-6 text-sm text-ink-300">
        Already have an account? <TextLink to={paths.auth.signIn.getHref()}>Sign in</TextLink>
      </p>
    </AuthLayout>
  );
}
