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

// What the next releases add; plain promises of scope, no sample numbers.
const COMING = [
  { title: "Designs", text: "Describe a vessel's insulation layer by layer and see its heat leak, boil-off and hold time." },
  { title: "Compare", text: "Put design revisions side by side to see which change matters most." },
  { title: "Library", text: "Shared materials and cryogen properties, each entry with its source and an approval step." },
];

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
      <Card title="Recent boil-off tests" actions={<TextLink to={paths.app.tests.getHref()}>All tests</TextLink>}>
        {tests.error ? <ErrorMessage error={tests.error} title="Could not load the tests" /> : null}
        {tests.data ? <RecentTests tests={tests.data.tests} hrefOf={testHref} threshold={settings.data?.threshold} /> : null}
      </Card>
    </div>
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
      <Card title={`${me.organization.name} on Frostfold`}>
        <p className="text-sm text-ink-200">
          Frostfold is being built in steps. Accounts and the team come first; planning tools arrive next. Nothing below is live yet.
        </p>
        <ul className="mt-5 grid gap-3 sm:grid-cols-2">
          {COMING.map((item) => (
            <li key={item.title} className="rounded-md border border-ink-700 bg-ink-950/60 p-4">
              <p className="flex items-center justify-between gap-2 font-medium text-ink-50">
                {item.title}
                <span className="rounded border border-ink-600 px-1.5 text-xs font-normal text-ink-300">coming</span>
              </p>
              <p className="mt-1 text-sm text-ink-300">{item.text}</p>
            </li>
          ))}
        </ul>
      </Card>
    </>
  );
}
