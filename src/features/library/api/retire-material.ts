import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MaterialDetailSchema } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

/** Retired entries can no longer be picked; every version still resolves for old designs. */
export const retireMaterial = ({ id, comment }: { id: string; comment: string | null }) =>
  apiRequest("POST", `/materials/${encodeURIComponent(id)}/retire`, { body: { comment }, schema: MaterialDetailSchema });

export function useRetireMaterial() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retireMaterial,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.all }),
  });
}
