// The JSON of the member and invitation endpoints, typed by the zod schemas the server checks
// its answers against (shared/schemas/members.ts).
export type {
  InvitationListResponse,
  InvitationResponse,
  Member,
  MemberList,
  MemberResponse,
  PendingInvitation,
} from '../../../../shared/schemas/members';
