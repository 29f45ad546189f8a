import { Callout } from "../../../components/ui/callout";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { LibraryNav } from "../../../features/library/components/library-nav";
import { ImportPanel } from "../../../features/library/components/import-panel";
import { Can } from "../../../lib/can";

export default function ImportRoute() {
  return (
    <>
      <title>Import library entries · Frostfold</title>
      <PageHeader title="Import library entries" description="Check a CSV file row by row first; nothing is written until every row is valid and you import it." />
      <LibraryNav />
      <Can action="propose:material" fallback={<Callout tone="info" title="Engineers and owners import entries">Your role reads the library.</Callout>}>
        <Card title="CSV file">
          <ImportPanel />
        </Card>
      </Can>
    </>
  );
}
