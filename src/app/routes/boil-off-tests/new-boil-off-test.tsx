import { useNavigate } from "react-router-dom";
import { Callout } from "../../../components/ui/callout";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { paths } from "../../../config/paths";
import { NewTestForm } from "../../../features/boil-off-tests/components/new-test-form";
import { Can } from "../../../lib/can";

export default function NewBoilOffTestRoute() {
  const navigate = useNavigate();
  return (
    <>
      <title>New boil-off test · Frostfold</title>
      <PageHeader title="New boil-off test" description="Pick the design revision whose prediction the test checks and say how the boil-off is measured; the logger file comes next." />
      <Can action="create:test" fallback={<Callout tone="info" title="Technicians, engineers and owners create tests">Your role reads the tests.</Callout>}>
        <Card>
          <NewTestForm onCreated={(test) => navigate(paths.app.test.getHref(test.id))} />
        </Card>
      </Can>
    </>
  );
}
