import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MaterialDetailSchema, type MaterialVersionInput } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

/** A new entry: version 1, a draft in the caller's organization. 409 "name_taken" is about the name. */
export const createMaterial = (input: MaterialVersionInput) =>
  apiRequest("POST", "/materials", { body: input, schema: MaterialDetailSchema });

export function useCreateMaterial() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMaterial,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.materials() }),
  });
}
