import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { AlertSettingsSchema, type AlertSettings } from "../../../../shared/schemas/alert";
import { apiRequest } from "../../../lib/api-client";
import { alertKeys } from "./alert-keys";

export const alertSettingsQueryOptions = () =>
  queryOptions({ queryKey: alertKeys.settings(), queryFn: ({ signal }) => apiRequest("GET", "/settings/alerts", { schema: AlertSettingsSchema, signal }), staleTime: 60_000 });

export const useAlertSettings = () => useQuery(alertSettingsQueryOptions());

export function useSaveAlertSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AlertSettings) => apiRequest("PUT", "/settings/alerts", { body: input, schema: AlertSettingsSchema }),
    onSuccess: (saved) => queryClient.setQueryData(alertKeys.settings(), saved),
  });
}
