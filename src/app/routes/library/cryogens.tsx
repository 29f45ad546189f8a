import type { QueryClient } from "@tanstack/react-query";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { cryogensQueryOptions, useCryogens } from "../../../features/library/api/get-cryogens";
import { CryogensTable } from "../../../features/library/components/cryogens-table";
import { LibraryNav } from "../../../features/library/components/library-nav";

export const clientLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(cryogensQueryOptions());
  return null;
};

export default function CryogensRoute() {
  const cryogens = useCryogens();
  return (
    <>
      <title>Cryogens · Frostfold</title>
      <PageHeader title="Cryogens" description="Saturated liquids at 1 atm (101.325 kPa): the approved entries designs and boil-off predictions use." />
      <LibraryNav />
      <Card title="Fluids">
        {cryogens.error ? <ErrorMessage error={cryogens.error} title="Could not load the cryogens" /> : null}
        {cryogens.isPending ? <Loading label="Loading cryogens…" /> : null}
        {cryogens.data ? <CryogensTable cryogens={cryogens.data.cryogens} /> : null}
      </Card>
    </>
  );
}
