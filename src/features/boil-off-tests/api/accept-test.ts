import { useMutation, useQueryClient } from "@tanstack/react-query";
import { TestDetailSchema } from "../../../../shared/schemas/boil-off-test";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const acceptTest = (testId: string) =>
  apiRequest("POST", `/boil-off-tests/${encodeURIComponent(testId)}/accept`, { schema: TestDetailSchema });

/** Accepting may raise an alert; the alerts feature's own queries refetch when Overview opens. */
export function useAcceptTest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptTest,
    onSuccess: (test) => {
      queryClient.setQueryData(testKeys.detail(test.id), test);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: testKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: testKeys.calibration(test.designId) }),
      ]);
    },
  });
}
