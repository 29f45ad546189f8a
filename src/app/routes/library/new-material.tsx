import { useNavigate } from "react-router-dom";
import { Callout } from "../../../components/ui/callout";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { LibraryNav } from "../../../features/library/components/library-nav";
import { NewMaterialForm } from "../../../features/library/components/propose-forms";
import { Can } from "../../../lib/can";

export default function NewMaterialRoute() {
  const navigate = useNavigate();
  return (
    <>
      <title>Propose a library entry · Frostfold</title>
      <PageHeader title="Propose a new entry" description="It starts as a draft; an owner approves it before designs can pick it. Values are SI, as the engine takes them." />
      <LibraryNav />
      <Can
        action="propose:material"
        fallback={
          <Callout tone="info" title="Engineers and owners propose entries">
            Your role reads the library. <TextLink to={paths.app.library.getHref()}>Back to the library</TextLink>
          </Callout>
        }
      >
        <Card>
          <NewMaterialForm onCreated={(detail) => navigate(paths.app.libraryEntry.getHref(detail.id))} />
        </Card>
      </Can>
    </>
  );
}
