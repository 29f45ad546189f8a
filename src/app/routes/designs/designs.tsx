import type { QueryClient } from "@tanstack/react-query";
import { useCallback, useState } from "react";
import { Link, useNavigate, useSearchParams } from "react-router-dom";
import type { DesignSummary } from "../../../../shared/schemas/design";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Button, buttonClass } from "../../../components/ui/button";
import { Card } from "../../../components/ui/card";
import { TextField } from "../../../components/ui/field";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { paths } from "../../../config/paths";
import { useDuplicateDesign } from "../../../features/designs/api/duplicate-design";
import { designsQueryOptions, useDesigns } from "../../../features/designs/api/get-designs";
import { DesignsTable } from "../../../features/designs/components/designs-table";
import { useDebouncedValue } from "../../../hooks/use-debounced-value";
import { Can, useCan } from "../../../lib/can";

export const clientLoader = (queryClient: QueryClient) => async ({ request }: { request: Request }) => {
  await queryClient.prefetchQuery(designsQueryOptions(new URL(request.url).searchParams.get("q") ?? ""));
  return null;
};

const hrefOf = (id: string) => paths.app.design.getHref(id);

export default function DesignsRoute() {
  const [params, setParams] = useSearchParams();
  const [text, setText] = useState(params.get("q") ?? "");
  const q = useDebouncedValue(text.trim(), 250);
  const designs = useDesigns(q);
  const navigate = useNavigate();
  const canEdit = useCan("edit:design");
  const duplicate = useDuplicateDesign();
  const { mutate } = duplicate;

  const rowActions = useCallback(
    (d: DesignSummary) => (
      <Button variant="ghost" size="sm" aria-label={`Duplicate ${d.name}`} onClick={() => mutate({ designId: d.id }, { onSuccess: (copy) => navigate(hrefOf(copy.id)) })}>
        Duplicate
      </Button>
    ),
    [mutate, navigate],
  );
  const selectionActions = useCallback(
    (picked: DesignSummary[]) => (
      <Button variant="secondary" disabled={picked.length < 2} onClick={() => navigate(paths.app.compare.getHref(picked.map((d) => d.id)))}>
        Compare {picked.length >= 2 ? picked.length : ""}
      </Button>
    ),
    [navigate],
  );

  return (
    <>
      <title>Designs · Frostfold</title>
      <PageHeader title="Designs" description="Every vessel's insulation design, with the heat into its cold vessel and its boil-off at the latest revision." />
      <div className="space-y-4">
        <div className="flex flex-wrap items-end justify-between gap-4">
          <div className="w-full max-w-sm">
            <TextField
              label="Search designs"
              type="search"
              value={text}
              onChange={(e) => {
                setText(e.target.value);
                setParams(e.target.value ? { q: e.target.value } : {}, { replace: true });
              }}
            />
          </div>
          <Can action="edit:design">
            <Link to={paths.app.newDesign.getHref()} className={buttonClass("primary")}>
              New design
            </Link>
          </Can>
        </div>
        {duplicate.error ? <ErrorMessage error={duplicate.error} title="Could not duplicate the design" /> : null}
        <Card>
          {designs.error ? <ErrorMessage error={designs.error} title="Could not load the designs" /> : null}
          {designs.isPending ? <Loading label="Loading designs…" /> : null}
          {designs.data ? <DesignsTable designs={designs.data.designs} hrefOf={hrefOf} rowActions={canEdit ? rowActions : null} selectionActions={selectionActions} /> : null}
        </Card>
      </div>
    </>
  );
}
