import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "../../../lib/api-client";
import { teamKeys } from "./team-keys";

export const removeMember = (memberId: string) =>
  apiRequest("DELETE", `/team/members/${encodeURIComponent(memberId)}`);

/** 409 "last_owner" is thrown to the caller: an organization always keeps one owner. */
export function useRemoveMember({ onRemoved }: { onRemoved?: (memberId: string) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: async (_nothing, memberId) => {
      await Promise.all([queryClient.invalidateQueries({ queryKey: teamKeys.all }), onRemoved?.(memberId)]);
    },
  });
}
