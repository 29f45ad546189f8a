import type { QueryClient } from "@tanstack/react-query";
import { useCallback, useMemo } from "react";
import { Link, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import { MaterialListQuerySchema, type MaterialListQuery } from "../../../../shared/schemas/material";
import { ErrorMessage } from "../../../components/errors/error-message";
import { buttonClass } from "../../../components/ui/button";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { paths } from "../../../config/paths";
import { materialsExportHref, materialsQueryOptions, materialsQueryString, useMaterials } from "../../../features/library/api/get-materials";
import { LibraryNav } from "../../../features/library/components/library-nav";
import { MaterialsFilters } from "../../../features/library/components/materials-filters";
import { MaterialsTable } from "../../../features/library/components/materials-table";
import { Can } from "../../../lib/can";

// The filters live in the address, so a filtered view can be shared and survives a reload.
// A hand-edited bad value is dropped rather than failing the screen.
function filtersFrom(params: URLSearchParams): MaterialListQuery {
  const raw = Object.fromEntries(["kind", "status", "q", "scope"].flatMap((k) => (params.get(k) ? [[k, params.get(k)]] : [])));
  const parsed = MaterialListQuerySchema.safeParse(raw);
  return parsed.success ? parsed.data : {};
}

export const clientLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await queryClient.prefetchQuery(materialsQueryOptions(filtersFrom(new URL(request.url).searchParams)));
  return null;
};

export default function MaterialsRoute() {
  const [params, setParams] = useSearchParams();
  const key = params.toString();
  const filters = useMemo(() => filtersFrom(new URLSearchParams(key)), [key]);
  const materials = useMaterials(filters);
  const setFilters = useCallback((next: MaterialListQuery) => setParams(new URLSearchParams(materialsQueryString(next)), { replace: true }), [setParams]);

  return (
    <>
      <title>Library · Frostfold</title>
      <PageHeader title="Library" description="Every number behind a prediction, with its source and temperature range. Owners approve each entry before designs can pick it." />
      <LibraryNav />
      <div className="space-y-6">
        <Can action="propose:material">
          <div className="flex flex-wrap gap-3">
            <Link to={paths.app.libraryNew.getHref()} className={buttonClass("primary")}>Propose a new entry</Link>
          </div>
        </Can>
        <Card title="Materials">
          <div className="space-y-4">
            <MaterialsFilters filters={filters} onChange={setFilters} />
            {materials.error ? <ErrorMessage error={materials.error} title="Could not load the library" /> : null}
            {materials.isPending ? <Loading label="Loading the library…" /> : null}
            {materials.data ? (
              <MaterialsTable
                materials={materials.data.materials}
                toolbar={
                  <a href={materialsExportHref(filters)} download className={buttonClass("secondary", "sm")}>
                    Export CSV ({materials.data.materials.length} shown)
                  </a>
                }
              />
            ) : null}
          </div>
        </Card>
      </div>
    </>
  );
}
