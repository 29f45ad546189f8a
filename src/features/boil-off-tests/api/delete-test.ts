import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const deleteTest = (testId: string) => apiRequest("DELETE", `/boil-off-tests/${encodeURIComponent(testId)}`);

/**
 * The lists lose the test. Its detail is left to expire from the cache rather than removed:
 * the test page is still mounted when this settles, and a removed query would be fetched again
 * at once by the page's own observer, to a 404.
 */
export function useDeleteTest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteTest,
    onSuccess: (_none, testId) =>
      Promise.all([queryClient.cancelQueries({ queryKey: testKeys.detail(testId) }), queryClient.invalidateQueries({ queryKey: testKeys.lists() })]),
  });
}
