import { ErrorMessage } from "../../../components/errors/error-message";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { useAlertSettings } from "../../../features/alerts/api/alert-settings";
import { OpenAlerts } from "../../../features/alerts/components/open-alerts";
import { useMe } from "../../../features/auth/api/get-me";
import { useTests } from "../../../features/boil-off-tests/api/get-tests";
import { RecentTests } from "../../../features/boil-off-tests/components/recent-tests";
import { useDesigns } from "../../../features/designs/api/get-designs";
import { RecentDesigns } from "../../../features/designs/components/recent-designs";

const testHref = (id: string) => paths.app.test.getHref(id);

/** Open alerts and the latest tests' ratios: what a technician or engineer checks first. */
function TestsOverview() {
  const tests = useTests();
  const settings = useAlertSettings();
  return (
    <div className="mb-6 grid gap-6 lg:grid-cols-2">
      <Card title="Open alerts">
        <OpenAlerts testHref={testHref} />
      </Card>
      <Card title="Recent tests" actions={<TextLink to={paths.app.tests.getHref()}>All tests</TextLink>}>
        {tests.error ? <ErrorMessage error={tests.error} title="Could not load the tests" /> : null}
        {tests.data ? <RecentTests tests={tests.data.tests} hrefOf={testHref} threshold={settings.data?.threshold} /> : null}
      </Card>
    </div>
  );
}

function RecentDesignsCard() {
  const designs = useDesigns();
  return (
    <Card title="Recent designs" actions={<TextLink to={paths.app.designs.getHref()}>All designs</TextLink>}>
      {designs.error ? <ErrorMessage error={designs.error} title="Could not load the designs" /> : null}
      {designs.data ? <RecentDesigns designs={designs.data.designs} /> : null}
    </Card>
  );
}

export default function OverviewRoute() {
  const { data: me } = useMe();
  if (!me) return null; // the shell's guard has already made sure Me is loaded
  return (
    <>
      <title>Overview · Frostfold</title>
      <PageHeader title={`Welcome, ${me.user.name}`} description={`You are signed in to ${me.organization.name} as ${me.role}.`} />
      <TestsOverview />
      <RecentDesignsCard />
    </>
  );
}
