import type { QueryClient } from "@tanstack/react-query";
import { useNavigate, useParams, type LoaderFunctionArgs } from "react-router-dom";
import { VENT_REFERENCE_CONDITIONS } from "../../../../shared/thermal/boil-off";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Card } from "../../../components/ui/card";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { useAlertSettings } from "../../../features/alerts/api/alert-settings";
import { useDeleteTest } from "../../../features/boil-off-tests/api/delete-test";
import { useSeries } from "../../../features/boil-off-tests/api/get-series";
import { testQueryOptions, useTest } from "../../../features/boil-off-tests/api/get-test";
import { AcceptPanel } from "../../../features/boil-off-tests/components/accept-panel";
import { AttachmentsPanel } from "../../../features/boil-off-tests/components/attachments-panel";
import { CalibrationPanel } from "../../../features/boil-off-tests/components/calibration-panel";
import { ComparisonPanel } from "../../../features/boil-off-tests/components/comparison-panel";
import { FitSummary } from "../../../features/boil-off-tests/components/fit-summary";
import { LiquidMassPanel } from "../../../features/boil-off-tests/components/liquid-mass-panel";
import { LogUploadPanel } from "../../../features/boil-off-tests/components/log-upload-panel";
import { NotesPanel } from "../../../features/boil-off-tests/components/notes-panel";
import { StatusBadge } from "../../../features/boil-off-tests/components/status-badge";
import { WindowSection } from "../../../features/boil-off-tests/components/window-section";
import { focusLiquidMassField } from "../../../features/boil-off-tests/utils/liquid-mass";
import { METHOD_LABELS } from "../../../features/boil-off-tests/utils/method-text";
import { useCan } from "../../../lib/can";
import { formatQuantity } from "../../../lib/format-quantity";
import { formatDateTime } from "../../../lib/format-time";
import { useUnitSystem } from "../../../lib/unit-system";

export const clientLoader = (queryClient: QueryClient) => async ({ params }: LoaderFunctionArgs) => {
  await queryClient.prefetchQuery(testQueryOptions(params.testId ?? ""));
  return null;
};

export default function BoilOffTestRoute() {
  const { testId = "" } = useParams();
  const test = useTest(testId);
  const series = useSeries(testId, Boolean(test.data?.log));
  const settings = useAlertSettings();
  const canCreate = useCan("create:test");
  const canComment = useCan("comment:test");
  const canDelete = useCan("delete:test");
  const canEditDesign = useCan("edit:design");
  const system = useUnitSystem();
  const navigate = useNavigate();
  const remove = useDeleteTest();

  if (test.isPending) return <Loading label="Loading the test…" />;
  if (test.error) return <ErrorMessage error={test.error} title="Could not load the test" />;
  const t = test.data;
  const open = t.status !== "accepted";
  const facts: [string, string][] = [
    ["Method", METHOD_LABELS[t.method]],
    ["Stage measured", `${t.stageLabel} (${t.cryogen})`],
    ["Date", formatDateTime(t.testedAt)],
    ["Ambient temperature", formatQuantity("temperature", t.ambientTemperature_K, system)],
    ["Ambient pressure", formatQuantity("pressure", t.ambientPressure_Pa, system, 5)],
    ["Capacity", formatQuantity("volume", t.capacity_L, system)],
    ...(t.ventReference ? [["Flowmeter reference", VENT_REFERENCE_CONDITIONS[t.ventReference].label] as [string, string]] : []),
    ...(t.fullScale_mm !== null ? [["Gauge full scale", `${t.fullScale_mm} mm`] as [string, string]] : []),
    ["Created by", t.createdBy ?? "—"],
  ];

  return (
    <>
      <title>{`${t.vesselLabel} · Boil-off test · Frostfold`}</title>
      <PageHeader
        title={t.vesselLabel}
        description={
          <span>
            Boil-off test of <TextLink to={paths.app.design.getHref(t.designId, t.revision)}>{t.designName}, revision {t.revision}</TextLink> · <StatusBadge status={t.status} />
          </span>
        }
      />
      <div className="grid gap-6 xl:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div className="min-w-0 space-y-6">
          {open && canCreate ? (
            <Card title={t.log ? "Logger file" : "Upload the logger file"}>
              {t.log ? <p className="mb-4 text-sm text-ink-300">{t.log.filename}: {t.log.rows.toLocaleString("en-US")} readings, uploaded {formatDateTime(t.log.uploadedAt)}.</p> : null}
              <LogUploadPanel key={t.log?.id ?? "none"} testId={t.id} method={t.method} replacing={Boolean(t.log)} />
            </Card>
          ) : null}
          {t.log ? (
            <Card title="Logged series and steady window">
              {series.error ? <ErrorMessage error={series.error} title="Could not load the chart" /> : null}
              {series.isPending ? <Loading label="Loading the chart…" /> : null}
              {series.data ? <WindowSection key={`${series.data.window.start_s}-${series.data.window.end_s}-${t.log.id}`} test={t} series={series.data} canSet={open && canCreate} /> : null}
            </Card>
          ) : null}
          {t.analysis ? (
            <>
              <Card title="Fit">
                <FitSummary analysis={t.analysis} />
              </Card>
              <Card title="Measured against predicted">
                <ComparisonPanel
                  analysis={t.analysis}
                  threshold={settings.data?.threshold}
                  onSetLiquidMass={open && canComment ? () => focusLiquidMassField(t.id) : undefined}
                  liquidMass={<LiquidMassPanel key={t.id} test={t} canEdit={canComment} variant="section" />}
                />
                <div className="mt-4">
                  <AcceptPanel test={t} canAccept={canCreate} />
                </div>
              </Card>
            </>
          ) : null}
        </div>
        <div className="min-w-0 space-y-6">
          <Card title="Test">
            <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1.5 text-sm">
              {facts.map(([k, v]) => (
                <div key={k} className="contents">
                  <dt className="text-ink-300">{k}</dt>
                  <dd className="text-ink-50">{v}</dd>
                </div>
              ))}
            </dl>
          </Card>
          {t.analysis ? null : <LiquidMassPanel key={t.id} test={t} canEdit={canComment} variant="card" />}
          <Card title="Calibration of the design">
            <CalibrationPanel designId={t.designId} designHref={(revision) => paths.app.design.getHref(t.designId, revision)} canApply={canEditDesign} />
          </Card>
          <Card title="Attachments">
            <AttachmentsPanel test={t} canUpload={canCreate} />
          </Card>
          <Card title="Notes">
            <NotesPanel key={t.id} testId={t.id} notes={t.notes} canEdit={canComment} />
          </Card>
          {canDelete ? (
            <ConfirmButton
              label="Delete this test"
              title={`Delete the test of ${t.vesselLabel}?`}
              description="The test, its log, its analysis and its attachments are removed for everyone. An accepted test no longer counts toward the design's calibration."
              confirmLabel="Delete test"
              onConfirm={() => remove.mutateAsync(t.id).then(() => navigate(paths.app.tests.getHref()))}
            />
          ) : null}
        </div>
      </div>
    </>
  );
}
