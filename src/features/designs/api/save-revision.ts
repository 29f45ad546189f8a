import { useMutation, useQueryClient } from "@tanstack/react-query";
import { RevisionDetailSchema, type SaveRevisionInput } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const saveRevision = ({ designId, input }: { designId: string; input: SaveRevisionInput }) =>
  apiRequest("POST", `/designs/${encodeURIComponent(designId)}/revisions`, { body: input, schema: RevisionDetailSchema });

/** A 409 "stale_revision" reaches the caller as ApiError; the caller keeps the edits on screen. */
export function useSaveRevision() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveRevision,
    onSuccess: (revision) => {
      queryClient.setQueryData(designKeys.revision(revision.designId, revision.revision), revision);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: designKeys.detail(revision.designId), exact: true }),
        queryClient.invalidateQueries({ queryKey: designKeys.lists() }),
      ]);
    },
  });
}
