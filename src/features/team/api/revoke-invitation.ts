import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "../../../lib/api-client";
import { teamKeys } from "./team-keys";

export const revokeInvitation = (invitationId: string) =>
  apiRequest("DELETE", `/team/invitations/${encodeURIComponent(invitationId)}`);

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
