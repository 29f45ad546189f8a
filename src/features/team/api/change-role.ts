import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Role } from "../../../../shared/permissions";
import { MemberSchema, type Member } from "../../../../shared/schemas/team";
import { apiRequest } from "../../../lib/api-client";
import { teamKeys } from "./team-keys";

export const changeRole = ({ memberId, role }: { memberId: string; role: Role }) =>
  apiRequest("PATCH", `/team/members/${encodeURIComponent(memberId)}`, { body: { role }, schema: MemberSchema });

/**
 * onChanged lets the route refresh the session when members change their own role; the team
 * feature does not know the auth feature's keys. 409 "last_owner" reaches the caller as ApiError.
 */
export function useChangeRole({ onChanged }: { onChanged?: (member: Member) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeRole,
    onSuccess: async (member) => {
      await Promise.all([queryClient.invalidateQueries({ queryKey: teamKeys.all }), onChanged?.(member)]);
    },
  });
}
