import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const deleteTest = (testId: string) => apiRequest("DELETE", `/boil-off-tests/${encodeURIComponent(testId)}`);

export function useDeleteTest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteTest,
    onSuccess: (_none, testId) => {
      queryClient.removeQueries({ queryKey: testKeys.detail(testId) });
      return queryClient.invalidateQueries({ queryKey: testKeys.lists() });
    },
  });
}
