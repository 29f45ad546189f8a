import { AuthLayout } from "../../components/layouts/auth-layout";
import { TextLink } from "../../components/ui/text-link";
import { paths } from "../../config/paths";

export default function NotFoundRoute() {
  return (
    <AuthLayout title="Page not found" intro="Nothing lives at this address. The link may be mistyped or out of date.">
      <title>Not found · Frostfold</title>
      <TextLink to={paths.app.overview.getHref()}>Go to the overview</TextLink>
    </AuthLayout>
  );
}
