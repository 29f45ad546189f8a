import { useMutation, useQueryClient } from "@tanstack/react-query";
import { InvitationSchema, type InviteInput } from "../../../../shared/schemas/team";
import { apiRequest } from "../../../lib/api-client";
import { teamKeys } from "./team-keys";

export const inviteMember = (input: InviteInput) =>
  apiRequest("POST", "/team/invitations", { body: input, schema: InvitationSchema });

/** onInvited lets the route refresh what the invitation also changed (the outbox). */
export function useInviteMember({ onInvited }: { onInvited?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteMember,
    onSuccess: async () => {
      await Promise.all([queryClient.invalidateQueries({ queryKey: teamKeys.all }), onInvited?.()]);
    },
  });
}
