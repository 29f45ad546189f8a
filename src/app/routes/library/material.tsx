import type { QueryClient } from "@tanstack/react-query";
import { Link, useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import type { MaterialDetail } from "../../../../shared/schemas/material";
import { ErrorMessage } from "../../../components/errors/error-message";
import { buttonClass } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { materialQueryOptions, useMaterial } from "../../../features/library/api/get-material";
import { CopyButton } from "../../../features/library/components/copy-button";
import { DecisionForm } from "../../../features/library/components/decision-form";
import { MaterialChart } from "../../../features/library/components/material-chart";
import { RetireButton } from "../../../features/library/components/retire-button";
import { ScopeLabel, StatusLabel } from "../../../features/library/components/status-label";
import { VersionDiff } from "../../../features/library/components/version-diff";
import { VersionHistory } from "../../../features/library/components/version-history";
import { VersionProperties } from "../../../features/library/components/version-properties";
import { KIND_LABELS } from "../../../features/library/utils/library-text";
import { formatDateTime } from "../../../lib/format-time";
import { useCan } from "../../../lib/can";

export const clientLoader = (queryClient: QueryClient) => async ({ params }: LoaderFunctionArgs) => {
  if (params.id) await queryClient.prefetchQuery(materialQueryOptions(params.id));
  return null;
};

/** What each role may do here; the server checks again, this only hides what would be refused. */
function Actions({ material }: { material: MaterialDetail }) {
  const navigate = useNavigate();
  const canPropose = useCan("propose:material");
  const canRetire = useCan("retire:material");
  const own = material.scope === "organization";
  const live = material.status !== "retired";
  const showPropose = canPropose && own && live && material.draftVersion === null;
  const showRetire = canRetire && own && live && material.currentVersion !== null;
  const showCopy = canPropose && material.scope === "seed" && material.currentVersion !== null;
  if (!showPropose && !showRetire && !showCopy) return null;
  return (
    <div className="flex flex-wrap items-start gap-3">
      {showPropose ? <Link to={paths.app.libraryPropose.getHref(material.id)} className={buttonClass("primary")}>Propose a change</Link> : null}
      {showCopy ? <CopyButton materialId={material.id} onCopied={(id) => navigate(paths.app.libraryEntry.getHref(id))} /> : null}
      {showRetire ? <RetireButton materialId={material.id} name={material.name} hasDraft={material.draftVersion !== null} /> : null}
    </div>
  );
}

function Entry({ material }: { material: MaterialDetail }) {
  const [params] = useSearchParams();
  const canApprove = useCan("approve:material");
  const asked = Number(params.get("version"));
  const shown = material.versions.find((v) => v.version === asked) ?? material.shown;
  const draft = material.draftVersion;

  return (
    <div className="space-y-6">
      <section aria-label="Entry status" className="flex flex-wrap items-center gap-x-5 gap-y-2 text-sm text-ink-200">
        <StatusLabel status={material.status} />
        <span>{KIND_LABELS[material.kind]}</span>
        <ScopeLabel scope={material.scope} />
        <span>Updated {formatDateTime(material.updatedAt)}</span>
      </section>
      {material.retired ? (
        <Callout tone="info" title="Retired">
          Retired {formatDateTime(material.retired.at)}{material.retired.by ? ` by ${material.retired.by}` : ""}{material.retired.comment ? `: ${material.retired.comment}` : ""}. Designs that use it keep their version; new designs cannot pick it.
        </Callout>
      ) : null}
      {draft !== null && shown.version !== draft ? (
        <Callout tone="info" title={`Version ${draft} is a draft waiting for an owner`}>
          <TextLink to={paths.app.libraryEntry.getHref(material.id, draft)}>Show version {draft}</TextLink>
        </Callout>
      ) : null}
      <Actions material={material} />
      {canApprove && draft !== null && material.scope === "organization" ? (
        <Card title={`Decide on version ${draft}`}>
          <DecisionForm key={draft} materialId={material.id} draftVersion={draft} />
        </Card>
      ) : null}
      <Card title={`Version ${shown.version}${shown.isCurrent ? " (current)" : ` (${shown.status})`}`}>
        <div className="space-y-6">
          <VersionProperties version={shown} />
          <MaterialChart version={shown} />
        </div>
      </Card>
      <Card title="Versions">
        <VersionHistory materialId={material.id} versions={material.versions} viewing={shown.version} />
      </Card>
      <Card title="What changed between two versions">
        <VersionDiff versions={material.versions} />
      </Card>
    </div>
  );
}

export default function MaterialRoute() {
  const { id = "" } = useParams();
  const material = useMaterial(id);
  return (
    <>
      <title>{`${material.data?.name ?? "Library entry"} · Frostfold`}</title>
      <p className="mb-2 text-sm">
        <TextLink to={paths.app.library.getHref()}>Library</TextLink>
      </p>
      <PageHeader title={material.data?.name ?? "Library entry"} />
      {material.error ? <ErrorMessage error={material.error} title="Could not load this entry" /> : null}
      {material.isPending ? <Loading label="Loading the entry…" /> : null}
      {material.data ? <Entry material={material.data} /> : null}
    </>
  );
}
