import { useMutation, useQueryClient } from "@tanstack/react-query";
import { DesignDetailSchema } from "../../../../shared/schemas/design";
import { apiRequest } from "../../../lib/api-client";
import { designKeys } from "./design-keys";

export const duplicateDesign = ({ designId, name }: { designId: string; name?: string }) =>
  apiRequest("POST", `/designs/${encodeURIComponent(designId)}/duplicate`, { body: name ? { name } : {}, schema: DesignDetailSchema });

export function useDuplicateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateDesign,
    onSuccess: (design) => {
      queryClient.setQueryData(designKeys.detail(design.id), design);
      return queryClient.invalidateQueries({ queryKey: designKeys.lists() });
    },
  });
}
