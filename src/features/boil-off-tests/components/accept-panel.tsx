import type { TestDetail } from "../../../../shared/schemas/boil-off-test";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { formatDateTime } from "../../../lib/format-time";
import { useAcceptTest } from "../api/accept-test";

/** Signing the analysis off freezes the log and the window; one over the threshold raises an alert. */
export function AcceptPanel({ test, canAccept }: { test: TestDetail; canAccept: boolean }) {
  const accept = useAcceptTest();
  if (test.status === "accepted") {
    return (
      <Callout tone="success" title="Analysis accepted">
        Accepted{test.acceptedBy ? ` by ${test.acceptedBy}` : ""}{test.acceptedAt ? ` on ${formatDateTime(test.acceptedAt)}` : ""}. The log and the window are frozen; log again in a new test.
      </Callout>
    );
  }
  if (test.status !== "analysed" || !canAccept) return null;
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-200">When the window and the fit look right, accept the analysis. It then counts toward the design's calibration and can no longer change.</p>
      {accept.error ? <ErrorMessage error={accept.error} title="The analysis was not accepted" /> : null}
      <Button onClick={() => accept.mutate(test.id)} busy={accept.isPending}>Accept the analysis</Button>
    </div>
  );
}
