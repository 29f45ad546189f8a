import { queryOptions, useQuery } from "@tanstack/react-query";
import { InvitationPreviewSchema } from "../../../../shared/schemas/team";
import { apiRequest } from "../../../lib/api-client";
import { authKeys } from "./auth-keys";

export type { InvitationPreview } from "../../../../shared/schemas/team";

export const getInvitation = (token: string, signal?: AbortSignal) =>
  apiRequest("GET", `/invitations/${encodeURIComponent(token)}`, { schema: InvitationPreviewSchema, signal });

// An invalid token stays invalid: no retries, and never refetch a preview that loaded.
export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    staleTime: Infinity,
    retry: false,
    meta: { ignoreUnauthorized: true },
  });

export const useInvitation = (token: string) => useQuery({ ...invitationQueryOptions(token), enabled: token.length > 0 });
