import type { QueryClient } from "@tanstack/react-query";
import { Link } from "react-router-dom";
import { ErrorMessage } from "../../../components/errors/error-message";
import { buttonClass } from "../../../components/ui/button";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { paths } from "../../../config/paths";
import { useAlertSettings } from "../../../features/alerts/api/alert-settings";
import { AlertThreshold } from "../../../features/alerts/components/alert-threshold-form";
import { testsQueryOptions, useTests } from "../../../features/boil-off-tests/api/get-tests";
import { TestsTable } from "../../../features/boil-off-tests/components/tests-table";
import { Can } from "../../../lib/can";

export const clientLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(testsQueryOptions());
  return null;
};

const hrefOf = (id: string) => paths.app.test.getHref(id);

export default function BoilOffTestsRoute() {
  const tests = useTests();
  const settings = useAlertSettings();
  return (
    <>
      <title>Tests · Frostfold</title>
      <PageHeader title="Tests" description="Each measured boil-off, pinned to the design revision whose prediction it checks: measured heat leak, predicted, and their ratio." />
      <div className="space-y-4">
        <div className="flex justify-end">
          <Can action="create:test">
            <Link to={paths.app.newTest.getHref()} className={buttonClass("primary")}>New test</Link>
          </Can>
        </div>
        <Card>
          {tests.error ? <ErrorMessage error={tests.error} title="Could not load the tests" /> : null}
          {tests.isPending ? <Loading label="Loading tests…" /> : null}
          {tests.data ? <TestsTable tests={tests.data.tests} hrefOf={hrefOf} threshold={settings.data?.threshold} /> : null}
        </Card>
        <Card title="Alert threshold" as="h2">
          <AlertThreshold />
        </Card>
      </div>
    </>
  );
}
