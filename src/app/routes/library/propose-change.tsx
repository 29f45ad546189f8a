import type { QueryClient } from "@tanstack/react-query";
import { useNavigate, useParams, type LoaderFunctionArgs } from "react-router-dom";
import type { MaterialDetail } from "../../../../shared/schemas/material";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Callout } from "../../../components/ui/callout";
import { Card } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { Loading } from "../../../components/ui/spinner";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { materialQueryOptions, useMaterial } from "../../../features/library/api/get-material";
import { ProposeChangeForm } from "../../../features/library/components/propose-forms";
import { useCan } from "../../../lib/can";

export const clientLoader = (queryClient: QueryClient) => async ({ params }: LoaderFunctionArgs) => {
  if (params.id) await queryClient.prefetchQuery(materialQueryOptions(params.id));
  return null;
};

/** Why a change cannot be proposed now, in the server's terms, or null when it can. */
function blocked(material: MaterialDetail, canPropose: boolean): string | null {
  if (!canPropose) return "Your role reads the library; engineers and owners propose changes.";
  if (material.scope === "seed") return "Seed entries are shared by every organization and cannot change. Copy it to our library first.";
  if (material.status === "retired") return "This entry is retired; copy it to start a new one.";
  if (material.draftVersion !== null) return `Version ${material.draftVersion} is still a draft: an owner approves or rejects it first.`;
  return null;
}

export default function ProposeChangeRoute() {
  const { id = "" } = useParams();
  const navigate = useNavigate();
  const material = useMaterial(id);
  const canPropose = useCan("propose:material");
  const reason = material.data ? blocked(material.data, canPropose) : null;
  return (
    <>
      <title>Propose a change · Frostfold</title>
      <p className="mb-2 text-sm">
        <TextLink to={paths.app.libraryEntry.getHref(id)}>{material.data?.name ?? "Back to the entry"}</TextLink>
      </p>
      <PageHeader title="Propose a change" description="The new version is a draft; the approved one stays in use until an owner decides." />
      {material.error ? <ErrorMessage error={material.error} title="Could not load this entry" /> : null}
      {material.isPending ? <Loading label="Loading the entry…" /> : null}
      {reason ? <Callout tone="info" title="No change can be proposed now">{reason}</Callout> : null}
      {material.data && !reason ? (
        <Card>
          <ProposeChangeForm material={material.data} onProposed={(detail) => navigate(paths.app.libraryEntry.getHref(detail.id, detail.draftVersion ?? undefined))} />
        </Card>
      ) : null}
    </>
  );
}
