import { useMutation, useQueryClient } from "@tanstack/react-query";
import { DesignDetailSchema, type CreateDesignInput } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const createDesign = (input: CreateDesignInput) => apiRequest("POST", "/designs", { body: input, schema: DesignDetailSchema });

export function useCreateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDesign,
    onSuccess: (design) => {
      queryClient.setQueryData(designKeys.detail(design.id), design);
      return queryClient.invalidateQueries({ queryKey: designKeys.lists() });
    },
  });
}
