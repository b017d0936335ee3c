import type { Member } from '../api/types';
import { MemberRow } from './member-row';

interface MemberListProps {
  orgId: string;
  organizationName: string;
  members: Member[];
  currentUserId: string;
  roleOptions: { value: string; label: string }[];
}

export function MemberList({
  orgId,
  organizationName,
  members,
  currentUserId,
  roleOptions,
}: MemberListProps) {
  return (
    <ul
      aria-label="Members"
      className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white shadow-card"
    >
      {members.map((member) => (
        <MemberRow
          key={member.id}
          orgId={orgId}
          organizationName={organizationName}
          member={member}
          isSelf={member.user.id === currentUserId}
          roleOptions={roleOptions}
        />
      ))}
    </ul>
  );
}
