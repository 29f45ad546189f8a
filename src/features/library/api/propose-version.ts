import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MaterialDetailSchema, type MaterialVersionInput } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

/** A proposed change: a new draft version; the approved one stays current until an owner decides. */
export const proposeVersion = ({ id, input }: { id: string; input: MaterialVersionInput }) =>
  apiRequest("POST", `/materials/${encodeURIComponent(id)}/versions`, { body: input, schema: MaterialDetailSchema });

export function useProposeVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: proposeVersion,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.materials() }),
  });
}
