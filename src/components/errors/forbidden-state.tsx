import type { ReactNode } from 'react';
import type { Role } from '../../../shared/constants';
import { roleLabel } from '../../lib/format';
import { Icon } from '../ui/icons';

/** Shown inside the app shell when the signed-in role may not use a page. */
export function ForbiddenState({
  role,
  pageName,
  allowedRoles = 'managers',
  action,
}: {
  role: Role;
  pageName: string;
  /** who may use the page, in words: "managers", "managers and technicians" */
  allowedRoles?: string;
  action?: ReactNode;
}) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-xl border border-field-200 bg-white px-6 py-10 text-center">
      <title>Not available · Hourstone</title>
      <span className="flex size-14 items-center justify-center rounded-full bg-oat-100 text-loam-700">
        <Icon name="lock" className="size-7" />
      </span>
      <h1 className="text-2xl font-black text-field-950">Not available for your role</h1>
      <p className="max-w-md text-field-700">
        {pageName} is for {allowedRoles}. Your role here is {roleLabel(role)}; ask a manager of this
        organization if you need something changed.
      </p>
      {action}
    </div>
  );
}
