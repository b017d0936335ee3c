// `npm run org:create -- --kind farm --name "Hillside Farm" --manager-email ann@example.com`:
// the self-hosting operator's way to start an organization (also with SIGNUP=closed). It creates
// the farm or dealer with nobody in it and sends its first manager (a dealer's: advisor) the
// usual invitation, queued in the outbox for the worker to deliver. Options:
//   --kind farm|dealer      required
//   --name NAME             required
//   --manager-email EMAIL   required: who runs it; the invitation's link lets them in
//   --manager-name NAME     the greeting of the invitation (default: the e-mail's local part)
//   --time-zone ZONE        IANA name (default UTC; the manager can change it in Settings)
//   --currency CODE         ISO 4217 (default USD)
//   --units metric|imperial units (default metric); a dealer's are its parts forecast's
// DATABASE_URL names the database; without it the project's development cluster is used.
import { randomBytes } from 'node:crypto';
import { parseArgs } from 'node:util';
import { pathToFileURL } from 'node:url';
import { z } from 'zod';
import { email, personName } from '../shared/schemas/common';
import {
  organizationCreateSchema,
  type OrganizationCreateInput,
} from '../shared/schemas/organizations';

export class UsageError extends Error {}

export interface OrgCreateRequest {
  input: OrganizationCreateInput;
  manager: { email: string; name: string };
}

const OPTIONS = {
  kind: { type: 'string' },
  name: { type: 'string' },
  'manager-email': { type: 'string' },
  'manager-name': { type: 'string' },
  'time-zone': { type: 'string' },
  currency: { type: 'string' },
  units: { type: 'string' },
} as const;

const fail = (issues: z.core.$ZodIssue[], option: (path: string) => string) =>
  new UsageError(issues.map((i) => `${option(String(i.path[0] ?? ''))}: ${i.message}`).join('\n'));

const OPTION_OF: Record<string, string> = {
  kind: '--kind',
  name: '--name',
  timeZone: '--time-zone',
  currency: '--currency',
  units: '--units',
};

/** The organization and manager the command line names, or a UsageError saying what is wrong. */
export function parseOrgCreateArgs(argv: string[]): OrgCreateRequest {
  let values: Record<string, string | undefined>;
  try {
    ({ values } = parseArgs({
      args: argv,
      options: OPTIONS,
      strict: true,
      allowPositionals: false,
    }));
  } catch (error) {
    throw new UsageError((error as Error).message);
  }
  const managerEmail = email.safeParse(values['manager-email'] ?? '');
  if (!managerEmail.success) throw fail(managerEmail.error.issues, () => '--manager-email');
  const kind = values.kind;
  const organization = organizationCreateSchema.safeParse({
    kind,
    name: values.name ?? '',
    timeZone: values['time-zone'] ?? 'UTC',
    currency: values.currency ?? 'USD',
    ...(values.units !== undefined && { units: values.units }),
  });
  if (!organization.success) throw fail(organization.error.issues, (p) => OPTION_OF[p] ?? p);
  const managerName = personName.safeParse(
    values['manager-name'] ?? managerEmail.data.split('@')[0],
  );
  if (!managerName.success) throw fail(managerName.error.issues, () => '--manager-name');
  return {
    input: organization.data,
    manager: { email: managerEmail.data, name: managerName.data },
  };
}

async function main() {
  let request: OrgCreateRequest;
  try {
    request = parseOrgCreateArgs(process.argv.slice(2));
  } catch (error) {
    if (!(error instanceof UsageError)) throw error;
    console.error(`org:create: ${error.message}`);
    console.error(
      'usage: npm run org:create -- --kind farm|dealer --name NAME --manager-email EMAIL [--manager-name NAME] [--time-zone ZONE] [--currency CODE] [--units metric|imperial]',
    );
    process.exit(2);
  }
  // The settings the server checks at import, before any server module loads: the database
  // (else the development cluster, started for the command when it is not running) and a
  // session secret (nothing this command does is signed, so any will do when none is set).
  process.env.JWT_SECRET ??= randomBytes(48).toString('base64url');
  let postgres: { stop(): Promise<void> } | undefined;
  if (!process.env.DATABASE_URL) {
    const { startPostgres } = await import('./lib/postgres.mjs');
    const cluster = await startPostgres({ name: 'dev' });
    process.env.DATABASE_URL = cluster.databaseUrl;
    postgres = cluster;
  }
  const { sequelize } = await import('../server/db');
  const { env } = await import('../server/env');
  const { createOrganizationWithInvitation } = await import('../server/services/organizations');
  const { INVITATION_DAYS } = await import('../server/services/accounts');
  try {
    const { organization } = await createOrganizationWithInvitation(request.input, request.manager);
    const role = organization.kind === 'farm' ? 'manager' : 'advisor';
    console.log(
      `org:create: created ${organization.kind} "${organization.name}" (${organization.id}) and invited ${request.manager.email} as its ${role}.`,
    );
    console.log(
      `org:create: the invitation is queued in the outbox; the worker sends it. Its link (${env.APP_URL}/invitations/…) works once and expires in ${INVITATION_DAYS} days.`,
    );
  } catch (error) {
    console.error('org:create: failed:', error instanceof Error ? error.message : error);
    process.exitCode = 1;
  } finally {
    await sequelize.close();
    await postgres?.stop();
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) await main();
