import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { AlertSchema } from "../../../../shared/schemas/alert";
import { apiRequest } from "../../../lib/api-client";
import { alertKeys } from "./alert-keys";

const AlertListSchema = z.object({ alerts: z.array(AlertSchema) });

// Stale at once: an accepted test anywhere in the organization may have raised one.
export const openAlertsQueryOptions = () =>
  queryOptions({ queryKey: alertKeys.open(), queryFn: ({ signal }) => apiRequest("GET", "/alerts", { schema: AlertListSchema, signal }), staleTime: 0 });

export const useOpenAlerts = () => useQuery(openAlertsQueryOptions());
