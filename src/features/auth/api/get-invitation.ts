import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { RoleSchema } from "../../../../shared/schemas/auth";
import { apiRequest } from "../../../lib/api-client";
import { authKeys } from "./auth-keys";

// shared/schemas has no schema for this preview yet; keep it in step with GET /api/invitations/:token.
export const InvitationPreviewSchema = z.object({ email: z.string(), role: RoleSchema, organizationName: z.string() });
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;

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
