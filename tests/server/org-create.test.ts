import { spawn } from 'node:child_process';
import path from 'node:path';
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { Invitation, Membership, Organization } from '../../server/models';
import { parseOrgCreateArgs, UsageError } from '../../scripts/org-create';
import { countRows, resetDatabase } from '../support/db';
import { clearMail, firstLink, mailTo } from '../support/mail';

const app = createApp();
const root = path.resolve(import.meta.dirname, '..', '..');

/** Runs `npm run org:create -- …` as an operator would (tsx, this test run's environment). */
function orgCreate(args: string[]): Promise<{ code: number | null; out: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(
      path.join(root, 'node_modules', '.bin', 'tsx'),
      ['scripts/org-create.ts', ...args],
      {
        cwd: root,
        env: process.env,
        stdio: ['ignore', 'pipe', 'pipe'],
      },
    );
    let out = '';
    child.stdout.on('data', (chunk) => (out += chunk));
    child.stderr.on('data', (chunk) => (out += chunk));
    child.on('error', reject);
    child.on('exit', (code) => resolve({ code, out }));
  });
}

describe('org:create — the operator starts an organization and invites its manager', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('org:create — a farm — exit 0; the farm exists with nobody in it, and its manager-to-be joins through the e-mailed invitation', async () => {
    const run = await orgCreate([
      '--kind',
      'farm',
      '--name',
      'Larchmoor Farm',
      '--manager-email',
      'Tove@Larchmoor.example',
      '--manager-name',
      'Tove Arden',
      '--time-zone',
      'Europe/Dublin',
      '--currency',
      'eur',
    ]);
    expect(run.out).toMatch(/created farm "Larchmoor Farm"/);
    expect(run.code).toBe(0);
    const farm = await Organization.findOne({ where: { name: 'Larchmoor Farm' } });
    expect(farm).toMatchObject({ kind: 'farm', timeZone: 'Europe/Dublin', currency: 'EUR' });
    expect(await Membership.count()).toBe(0);
    const invitation = await Invitation.findOne({ where: { organizationId: farm!.id } });
    expect(invitation).toMatchObject({
      email: 'tove@larchmoor.example',
      role: 'manager',
      invitedBy: null,
    });

    const mail = await mailTo('tove@larchmoor.example');
    expect(mail.subject).toBe('You are invited to Larchmoor Farm on Hourstone');
    const token = new URL(firstLink(mail.text)).pathname.split('/').pop()!;
    const joined = await request(app)
      .post(`/api/v1/invitations/${token}/accept`)
      .send({ name: 'Tove Arden', password: 'a-long-manager-password' });
    expect(joined.status).toBe(200);
    expect(joined.body.data.memberships).toEqual([
      expect.objectContaining({
        role: 'manager',
        organization: expect.objectContaining({ id: farm!.id }),
      }),
    ]);
  });

  it('org:create — a required option missing — exit 2 naming it, nothing written', async () => {
    const run = await orgCreate(['--kind', 'farm', '--name', 'No Manager Farm']);
    expect(run.code).toBe(2);
    expect(run.out).toMatch(/--manager-email: Enter a valid e-mail address/);
    expect(await countRows('organizations')).toBe(0);
    expect(await countRows('invitations')).toBe(0);
  });
});

describe('org:create — reading the command line', () => {
  it.each([
    [
      ['--kind', 'ranch', '--name', 'X', '--manager-email', 'a@b.example'],
      /--kind: Kind must be one of: farm, dealer/,
    ],
    [['--kind', 'farm', '--name', '', '--manager-email', 'a@b.example'], /--name: Enter a name/],
    [
      [
        '--kind',
        'farm',
        '--name',
        'X',
        '--manager-email',
        'a@b.example',
        '--time-zone',
        'Nowhere/Land',
      ],
      /--time-zone: Time zone must be an IANA name/,
    ],
    [
      ['--kind', 'dealer', '--name', 'X', '--manager-email', 'a@b.example', '--units', 'cubits'],
      /--units: Units must be one of: metric, imperial/,
    ],
    [
      ['--kind', 'farm', '--name', 'X', '--manager-email', 'a@b.example', '--colour', 'red'],
      /Unknown option '--colour'/,
    ],
  ])('org:create args %j — refused with %s', (argv, message) => {
    expect(() => parseOrgCreateArgs(argv)).toThrow(UsageError);
    expect(() => parseOrgCreateArgs(argv)).toThrow(message);
  });

  it('org:create args — a dealer with defaults — UTC, USD, the advisor greeted by the local part', () => {
    expect(
      parseOrgCreateArgs([
        '--kind',
        'dealer',
        '--name',
        'Kestrel Parts',
        '--manager-email',
        'ines@kestrel.example',
      ]),
    ).toEqual({
      input: {
        kind: 'dealer',
        name: 'Kestrel Parts',
        timeZone: 'UTC',
        currency: 'USD',
        units: 'metric',
      },
      manager: { email: 'ines@kestrel.example', name: 'ines' },
    });
  });
});
