import { Link } from "react-router-dom";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Button } from "../../../components/ui/button";
import { Loading } from "../../../components/ui/spinner";
import { linkClass } from "../../../components/ui/text-link";
import { formatNumber } from "../../../lib/format-quantity";
import { useApplyCalibration, useCalibration } from "../api/get-calibration";

/**
 * From the design's accepted tests, the degradation factor they imply (measured over predicted,
 * weighted by each ratio's uncertainty), and the offer to save it into a new revision.
 */
export function CalibrationPanel({ designId, designHref, canApply }: { designId: string; designHref: (revision?: number) => string; canApply: boolean }) {
  const calibration = useCalibration(designId);
  const apply = useApplyCalibration();
  if (calibration.isPending) return <Loading label="Loading the calibration…" />;
  if (calibration.error) return <ErrorMessage error={calibration.error} title="Could not load the calibration" />;
  const c = calibration.data;
  if (c.factor === null || c.factorStdError === null) {
    return <p className="text-sm text-ink-300">No accepted test of this design yet: accept an analysis and its ratio calibrates the design.</p>;
  }
  return (
    <div className="space-y-3 text-sm">
      <p>
        Implied degradation factor: <span className="font-mono text-lg text-ink-50">{formatNumber(c.factor, 3)} ± {formatNumber(c.factorStdError, 3)}</span>{" "}
        from {c.tests.length} accepted test{c.tests.length === 1 ? "" : "s"}.
      </p>
      <p className="text-xs text-ink-300">{c.method}</p>
      <ul className="list-disc pl-5 text-ink-300">
        {c.tests.map((t) => <li key={t.id}>{t.vesselLabel}, revision {t.revision}, {t.stageLabel}: {formatNumber(t.ratio, 3)} ± {formatNumber(t.ratioStdError, 3)}</li>)}
      </ul>
      {apply.data ? (
        <p role="status" className="text-moss-300">
          Saved as <Link className={linkClass} to={designHref(apply.data.revision)}>revision {apply.data.revision}</Link>
          {apply.data.calibration.clampedBlocks.length > 0 ? `; ${apply.data.calibration.clampedBlocks.length} block(s) were held at the factor's allowed limit` : ""}.
        </p>
      ) : canApply ? (
        <div className="space-y-2">
          <p className="text-ink-300">Saving multiplies every block's degradation factor in revision {c.latestRevision} by this factor, as a new revision; the old revisions and these tests stay as they are.</p>
          {apply.error ? <ErrorMessage error={apply.error} title="The calibrated revision was not saved" /> : null}
          <Button variant="secondary" busy={apply.isPending} onClick={() => apply.mutate({ designId, baseRevision: c.latestRevision })}>Save as a new revision</Button>
        </div>
      ) : null}
    </div>
  );
}
