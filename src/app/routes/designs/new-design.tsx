import type { QueryClient } from "@tanstack/react-query";
import { useMemo } from "react";
import { useNavigate } from "react-router-dom";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Callout } from "../../../components/ui/callout";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { libraryPicksQueryOptions, useLibraryPicks, type LibraryPicks } from "../../../features/designs/api/get-library-picks";
import { CreateDesignBar } from "../../../features/designs/components/create-design-bar";
import { DesignEditor } from "../../../features/designs/components/design-editor";
import { defaultContent } from "../../../features/designs/lib/default-content";
import { useCan } from "../../../lib/can";

export const clientLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(libraryPicksQueryOptions());
  return null;
};

function NewDesignWorkspace({ picks }: { picks: LibraryPicks }) {
  const navigate = useNavigate();
  const initial = useMemo(() => defaultContent(picks), [picks]);
  return (
    <DesignEditor
      initial={initial}
      known={[]}
      picks={picks}
      readOnly={false}
      toolbar={(form) => <CreateDesignBar form={form} onCreated={(design) => navigate(paths.app.design.getHref(design.id), { replace: true })} />}
    />
  );
}

export default function NewDesignRoute() {
  const picks = useLibraryPicks();
  const canEdit = useCan("edit:design");
  return (
    <>
      <title>New design · Frostfold</title>
      <PageHeader title="New design" description="Start from a plain cylinder and change it: the results follow every edit. Nothing is stored until you create the design." />
      {!canEdit ? (
        <Callout tone="info" title="Engineers and owners create designs">
          Your role reads designs. <TextLink to={paths.app.designs.getHref()}>Back to the designs</TextLink>
        </Callout>
      ) : picks.error ? (
        <ErrorMessage error={picks.error} title="Could not load the library" />
      ) : picks.data ? (
        <NewDesignWorkspace picks={picks.data} />
      ) : (
        <Loading label="Loading the library…" />
      )}
    </>
  );
}
