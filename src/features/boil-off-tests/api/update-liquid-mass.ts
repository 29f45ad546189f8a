import { useMutation, useQueryClient } from "@tanstack/react-query";
import { TestDetailSchema } from "../../../../shared/schemas/boil-off-test";
import { apiRequest, isApiError } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

/** The figures the barometric correction needs for the liquid mass; null clears one. */
export type LiquidMassPatch = { tareMass_kg: number | null } | { fillFraction: number | null };

export const updateLiquidMass = ({ testId, patch }: { testId: string; patch: LiquidMassPatch }) =>
  apiRequest("PATCH", `/boil-off-tests/${encodeURIComponent(testId)}`, { body: patch, schema: TestDetailSchema });

/**
 * The server re-runs the analysis, so the lists' measured and ratio columns change too. A 409
 * (accepted meanwhile, or a new log) means the page is out of date: the test is fetched again.
 */
export function useUpdateLiquidMass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateLiquidMass,
    onSuccess: (test) => {
      queryClient.setQueryData(testKeys.detail(test.id), test);
      return queryClient.invalidateQueries({ queryKey: testKeys.lists() });
    },
    onError: (error, { testId }) => {
      if (isApiError(error) && error.status === 409) return queryClient.invalidateQueries({ queryKey: testKeys.detail(testId) });
    },
  });
}
