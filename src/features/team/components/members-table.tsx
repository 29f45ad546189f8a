import type { Member } from "../../../../shared/schemas/team";
import { useCan } from "../../../lib/can";
import { MemberRow } from "./member-row";

type MembersTableProps = {
  members: Member[];
  currentUserId: string;
  onMemberChanged?: (member: Member) => unknown;
  onMemberRemoved?: (memberId: string) => unknown;
};

/** Everyone who can read the team sees this list; only "manage:team" adds the controls. */
export function MembersTable({ members, currentUserId, onMemberChanged, onMemberRemoved }: MembersTableProps) {
  const canManage = useCan("manage:team");
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Members and their roles</caption>
        <thead>
          <tr className="text-left text-xs uppercase tracking-wider text-ink-300">
            <th scope="col" className="pb-2 pr-4 font-medium">Name</th>
            <th scope="col" className="pb-2 pr-4 font-medium">E-mail</th>
            <th scope="col" className="pb-2 pr-4 font-medium">Role</th>
            <th scope="col" className="pb-2 pr-4 font-medium">Joined</th>
            {canManage ? <th scope="col" className="pb-2 text-right font-medium"><span className="sr-only">Actions</span></th> : null}
          </tr>
        </thead>
        <tbody>
          {members.map((member) => (
            <MemberRow
              key={member.id}
              member={member}
              isSelf={member.id === currentUserId}
              canManage={canManage}
              onChanged={onMemberChanged}
              onRemoved={onMemberRemoved}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
}
