import { ErrorMessage } from "../../../components/errors/error-message";
import { Button } from "../../../components/ui/button";
import { WarningIcon } from "../../../components/ui/icons";
import { Loading } from "../../../components/ui/spinner";
import { TextLink } from "../../../components/ui/text-link";
import { formatNumber, formatQuantity } from "../../../lib/format-quantity";
import { formatDateTime } from "../../../lib/format-time";
import { useCan } from "../../../lib/can";
import { useUnitSystem } from "../../../lib/unit-system";
import { useAcknowledgeAlert } from "../api/acknowledge-alert";
import { useOpenAlerts } from "../api/get-alerts";

/** The organization's open alerts, each with its test and, for those allowed, an acknowledge button. */
export function OpenAlerts({ testHref }: { testHref: (testId: string) => string }) {
  const alerts = useOpenAlerts();
  const acknowledge = useAcknowledgeAlert();
  const canAcknowledge = useCan("acknowledge:alert");
  const system = useUnitSystem();
  if (alerts.isPending) return <Loading label="Loading alerts…" />;
  if (alerts.error) return <ErrorMessage error={alerts.error} title="Could not load the alerts" />;
  if (alerts.data.alerts.length === 0) return <p className="text-sm text-ink-300">No open alert: every accepted test is within its threshold.</p>;
  return (
    <div className="space-y-3">
      {acknowledge.error ? <ErrorMessage error={acknowledge.error} title="The alert was not acknowledged" /> : null}
      <ul aria-label="Open alerts" className="space-y-3">
        {alerts.data.alerts.map((a) => (
          <li key={a.id} className="rounded-md border border-ember-400/70 bg-ember-900/20 p-4 text-sm">
            <div className="flex flex-wrap items-start justify-between gap-3">
              <div className="space-y-1">
                <p className="flex items-center gap-2 font-semibold text-ember-200">
                  <WarningIcon className="size-4" />
                  {a.vesselLabel}: {formatNumber(a.ratio, 3)}× its prediction
                </p>
                <p className="text-ink-200">
                  {a.designName}, revision {a.revision}: measured {formatQuantity("heat", a.measuredHeatLeak_W, system)} against {formatQuantity("heat", a.predictedHeatLeak_W, system)} predicted; threshold {formatNumber(a.threshold, 3)}×.
                </p>
                <p className="text-ink-300">
                  Raised {formatDateTime(a.createdAt)} · <TextLink to={testHref(a.testId)}>Open the test</TextLink>
                </p>
              </div>
              {canAcknowledge ? (
                <Button variant="secondary" size="sm" aria-label={`Acknowledge the alert on ${a.vesselLabel}`} busy={acknowledge.isPending && acknowledge.variables === a.id} onClick={() => acknowledge.mutate(a.id)}>
                  Acknowledge
                </Button>
              ) : null}
            </div>
          </li>
        ))}
      </ul>
    </div>
  );
}
