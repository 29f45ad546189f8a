import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import { useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import type { DesignDetail, RevisionDetail } from "../../../../shared/schemas/design";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { paths } from "../../../config/paths";
import { designKeys } from "../../../features/designs/api/design-keys";
import { designQueryOptions, useDesign } from "../../../features/designs/api/get-design";
import { libraryPicksQueryOptions, useLibraryPicks, type LibraryPicks } from "../../../features/designs/api/get-library-picks";
import { revisionQueryOptions, useRevision } from "../../../features/designs/api/get-revision";
import { DesignEditor } from "../../../features/designs/components/design-editor";
import { DesignToolbar } from "../../../features/designs/components/design-toolbar";
import { RevisionDiff } from "../../../features/designs/components/revisions/revision-diff";
import { RevisionsList } from "../../../features/designs/components/revisions/revisions-list";
import { useCan } from "../../../lib/can";

const revisionOf = (search: URLSearchParams) => {
  const n = Number(search.get("revision"));
  return Number.isInteger(n) && n > 0 ? n : null;
};

export const clientLoader = (queryClient: QueryClient) => async ({ params, request }: LoaderFunctionArgs) => {
  const id = params.designId ?? "";
  const rev = revisionOf(new URL(request.url).searchParams);
  await Promise.all([
    queryClient.prefetchQuery(designQueryOptions(id)),
    queryClient.prefetchQuery(libraryPicksQueryOptions()),
    rev ? queryClient.prefetchQuery(revisionQueryOptions(id, rev)) : null,
  ]);
  return null;
};

function Workspace({ design, shown, picks }: { design: DesignDetail; shown: RevisionDetail; picks: LibraryPicks }) {
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const canEdit = useCan("edit:design");
  const latestHref = paths.app.design.getHref(design.id);
  return (
    <DesignEditor
      // A new revision (or another one opened) is a fresh form: the key remounts it.
      key={`${design.id}@${shown.revision}`}
      initial={shown.content}
      savedPrediction={shown.prediction}
      known={shown.materials}
      picks={picks}
      readOnly={!canEdit}
      toolbar={(form) => (
        <DesignToolbar
          form={form}
          design={design}
          shown={shown}
          canEdit={canEdit}
          newestHref={latestHref}
          onSaved={() => navigate(latestHref, { replace: true })}
          onDuplicated={(copy) => navigate(paths.app.design.getHref(copy.id))}
          onReloadNewest={async () => {
            await queryClient.invalidateQueries({ queryKey: designKeys.detail(design.id), exact: true });
            await navigate(latestHref);
          }}
        />
      )}
      below={
        <Card title="Revisions">
          <RevisionsList revisions={design.revisions} shown={shown.revision} latest={design.latestRevision} hrefOf={(r) => paths.app.design.getHref(design.id, r)} />
          <h3 className="mb-3 mt-6 text-sm font-semibold text-ink-100">What changed between two revisions</h3>
          <RevisionDiff key={shown.revision} designId={design.id} revisions={design.revisions} shown={shown.revision} />
        </Card>
      }
    />
  );
}

export default function DesignRoute() {
  const { designId = "" } = useParams();
  const [search] = useSearchParams();
  const asked = revisionOf(search);
  const design = useDesign(designId);
  const picks = useLibraryPicks();
  const canEdit = useCan("edit:design");
  const latest = design.data?.latestRevision;
  const older = useRevision(designId, asked !== null && latest !== undefined && asked !== latest ? asked : null);
  const shown = asked === null || asked === latest ? design.data?.latest : older.data;
  const error = design.error ?? picks.error ?? older.error;

  return (
    <>
      <title>{`${design.data?.name ?? "Design"} · Frostfold`}</title>
      <PageHeader
        title={design.data?.name ?? "Design"}
        description={
          design.data ? `${design.data.vesselLabel ? `${design.data.vesselLabel}. ` : ""}${canEdit ? "Every edit updates the results; save a revision to keep it." : "Read-only for your role: engineers and owners edit designs."}` : undefined
        }
      />
      {error ? <ErrorMessage error={error} title="Could not load the design" /> : null}
      {!error && (!design.data || !picks.data || !shown) ? <Loading label="Loading the design…" /> : null}
      {design.data && picks.data && shown ? <Workspace design={design.data} shown={shown} picks={picks.data} /> : null}
    </>
  );
}
