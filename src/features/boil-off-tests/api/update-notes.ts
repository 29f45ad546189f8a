import { useMutation, useQueryClient } from "@tanstack/react-query";
import { TestDetailSchema } from "../../../../shared/schemas/boil-off-test";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const updateNotes = ({ testId, notes }: { testId: string; notes: string }) =>
  apiRequest("PATCH", `/boil-off-tests/${encodeURIComponent(testId)}`, { body: { notes }, schema: TestDetailSchema });

export function useUpdateNotes() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateNotes, onSuccess: (test) => queryClient.setQueryData(testKeys.detail(test.id), test) });
}
