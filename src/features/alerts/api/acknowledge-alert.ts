import { useMutation, useQueryClient } from "@tanstack/react-query";
import { AlertSchema } from "../../../../shared/schemas/alert";
import { apiRequest } from "../../../lib/api-client";
import { alertKeys } from "./alert-keys";

export const acknowledgeAlert = (alertId: string) =>
  apiRequest("POST", `/alerts/${encodeURIComponent(alertId)}/acknowledge`, { schema: AlertSchema });

export function useAcknowledgeAlert() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: acknowledgeAlert, onSuccess: () => queryClient.invalidateQueries({ queryKey: alertKeys.open() }) });
}
