import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MaterialDetailSchema } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

/** The entry's current version as a new draft of our own; the server picks a free "(copy)" name. */
export const copyMaterial = (id: string) =>
  apiRequest("POST", `/materials/${encodeURIComponent(id)}/copy`, { body: {}, schema: MaterialDetailSchema });

export function useCopyMaterial() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: copyMaterial,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.materials() }),
  });
}
