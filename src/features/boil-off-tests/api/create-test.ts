import { useMutation, useQueryClient } from "@tanstack/react-query";
import { TestDetailSchema, type CreateTestInput } from "../../../../shared/schemas/boil-off-test";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const createTest = (input: CreateTestInput) => apiRequest("POST", "/boil-off-tests", { body: input, schema: TestDetailSchema });

export function useCreateTest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTest,
    onSuccess: (test) => {
      queryClient.setQueryData(testKeys.detail(test.id), test);
      return queryClient.invalidateQueries({ queryKey: testKeys.lists() });
    },
  });
}
