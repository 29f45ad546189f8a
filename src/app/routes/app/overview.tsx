import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { useMe } from "../../../features/auth/api/get-me";

// What the next releases add; plain promises of scope, no sample numbers.
const COMING = [
  { title: "Designs", text: "Describe a vessel's insulation layer by layer and see its heat leak, boil-off and hold time." },
  { title: "Compare", text: "Put design revisions side by side to see which change matters most." },
  { title: "Library", text: "Shared materials and cryogen properties, each entry with its source and an approval step." },
  { title: "Tests", text: "Log measured boil-off from a vessel and set it against the prediction." },
  { title: "Alerts", text: "A notice when a measured boil-off drifts away from what the design predicted." },
];

export default function OverviewRoute() {
  const { data: me } = useMe();
  if (!me) return null; // the shell's guard has already made sure Me is loaded
  return (
    <>
      <title>Overview · Frostfold</title>
      <PageHeader title={`Welcome, ${me.user.name}`} description={`You are signed in to ${me.organization.name} as ${me.role}.`} />
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
