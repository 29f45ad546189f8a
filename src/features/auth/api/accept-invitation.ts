import { useMutation, useQueryClient } from "@tanstack/react-query";
import { MeSchema } from "../../../../shared/schemas/auth";
import type { AcceptInvitationInput } from "../../../../shared/schemas/team";
import { apiRequest } from "../../../lib/api-client";
import { startSession } from "./start-session";

export const acceptInvitation = (input: AcceptInvitationInput) =>
  apiRequest("POST", "/invitations/accept", { body: input, schema: MeSchema });

/**
 * Accepting signs the invitee in (200 Me), replacing any session this browser had, so every
 * cached query from a previous user is dropped before the new Me is written.
 */
export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (me) => startSession(queryClient, me),
  });
}
