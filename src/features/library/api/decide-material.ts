import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MaterialDetailSchema, type ApprovalInput } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

/** An owner approves or rejects the open draft; `version` makes a stale decision a 409, not a surprise. */
export const decideMaterial = ({ id, input }: { id: string; input: ApprovalInput }) =>
  apiRequest("POST", `/materials/${encodeURIComponent(id)}/approval`, { body: input, schema: MaterialDetailSchema });

// Approval can add a cryogen to the list designs pick from, so the cryogens key goes too.
export function useDecideMaterial() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: decideMaterial,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.all }),
  });
}
