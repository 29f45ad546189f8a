import { queryOptions, useQuery } from "@tanstack/react-query";
import { TeamSchema } from "../../../../shared/schemas/team";
import { apiRequest } from "../../../lib/api-client";
import { teamKeys } from "./team-keys";

export const getTeam = (signal?: AbortSignal) => apiRequest("GET", "/team/members", { schema: TeamSchema, signal });

// Members and invitations come in one answer, so one key covers both lists. Stale at once:
// other owners and invitees change the team from other browsers, and each visit should show it.
export const teamQueryOptions = () =>
  queryOptions({ queryKey: teamKeys.overview(), queryFn: ({ signal }) => getTeam(signal), staleTime: 0 });

export const useTeam = () => useQuery(teamQueryOptions());
