import type { Me } from '../../../lib/auth';
import { membershipLabel } from '../../../lib/format';
import { InitialsAvatar } from './initials-avatar';

/** Who is signed in, and where they belong. */
export function AccountDetails({ me }: { me: Me }) {
  return (
    <div className="flex flex-col gap-5">
      <div className="flex items-center gap-3">
        <InitialsAvatar name={me.user.name} />
        <dl className="grid min-w-0 gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
          <dt className="text-sm text-field-600">Name</dt>
          <dd className="font-bold text-field-950">{me.user.name}</dd>
          <dt className="text-sm text-field-600">E-mail</dt>
          <dd className="font-bold break-all text-field-950">{me.user.email}</dd>
        </dl>
      </div>
      <div>
        <h2 className="text-lg font-black text-field-900">Your organizations</h2>
        <ul className="mt-2 flex flex-col gap-1">
          {me.memberships.map((membership) => (
            <li key={membership.id} className="text-field-800">
              {membershipLabel(membership)}
            </li>
          ))}
        </ul>
      </div>
    </div>
  );
}
