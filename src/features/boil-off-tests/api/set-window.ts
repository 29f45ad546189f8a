import { useMutation, useQueryClient } from "@tanstack/react-query";
import { AnalysisSchema, type WindowInput } from "../../../../shared/schemas/boil-off-test";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const setWindow = ({ testId, window }: { testId: string; window: WindowInput }) =>
  apiRequest("PUT", `/boil-off-tests/${encodeURIComponent(testId)}/window`, { body: window, schema: AnalysisSchema });

/** A new window refits: the test (its analysis and ratio), its chart and the lists all change. */
export function useSetWindow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setWindow,
    onSuccess: (_analysis, { testId }) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: testKeys.detail(testId) }), queryClient.invalidateQueries({ queryKey: testKeys.lists() })]),
  });
}

/** Back to Frostfold's suggested window (the server forgets the one set by hand). */
export const resetWindow = (testId: string) =>
  apiRequest("DELETE", `/boil-off-tests/${encodeURIComponent(testId)}/window`, { schema: AnalysisSchema });

export function useResetWindow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resetWindow,
    onSuccess: (_analysis, testId) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: testKeys.detail(testId) }), queryClient.invalidateQueries({ queryKey: testKeys.lists() })]),
  });
}
