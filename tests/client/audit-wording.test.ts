// The farm's dealer activity log in words (src/features/dealers/components/audit-wording.ts): an
// action code or an API path on screen is what new users tripped on (issue 10).
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { describeAuditEvent } from '../../src/features/dealers/components/audit-wording';

const serverDir = path.resolve(import.meta.dirname, '../../server');

/** Every audit action code written in the server's source ('machine.return_to_service', …). */
function serverAuditActions(): string[] {
  const prefixes =
    'machine|defect|service|booking|dealer_link|dealer|reading|meter|task|template|checklist|' +
    'invitation|membership|organization|demo|user|password|walkaround';
  const literal = new RegExp(`'((?:${prefixes})\\.[a-z_]+)'`, 'g');
  const found = new Set<string>();
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const file = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(file);
      else if (entry.name.endsWith('.ts'))
        for (const m of readFileSync(file, 'utf8').matchAll(literal)) found.add(m[1]!);
    }
  };
  walk(path.join(serverDir, 'services'));
  walk(path.join(serverDir, 'middlewares'));
  // file names and column names that share the shape
  return [...found]
    .filter((a) => !/\.(json|csv|zip|ics|svg|png)$/.test(a) && a !== 'user.email')
    .sort();
}

const looksLikeCode = /[._/]|[a-z][A-Z]/;

describe('audit wording — the dealer activity log reads as sentences', () => {
  it.each([
    ['machine.return_to_service', 'returned a machine to service'],
    ['defect.close', 'closed a defect'],
    ['service.complete', 'recorded a service'],
  ])('%s — "%s"', (action, sentence) => {
    expect(describeAuditEvent({ action, entityType: 'machine' })).toBe(sentence);
  });

  it('dealer.read of machines/service-records/prefill — a sentence, not the API path', () => {
    expect(
      describeAuditEvent({ action: 'dealer.read', entityType: 'machines/service-records/prefill' }),
    ).toBe('looked at a machine’s due tasks to start a service record');
  });

  it('dealer.read of a path added later — still words: "looked at the farm’s records"', () => {
    expect(describeAuditEvent({ action: 'dealer.read', entityType: 'machines/new-thing' })).toBe(
      'looked at the farm’s records',
    );
  });

  it('every action the server records has a sentence without a code in it', () => {
    const actions = serverAuditActions();
    expect(actions).toContain('machine.return_to_service');
    const coded = actions
      .map((action) => ({ action, text: describeAuditEvent({ action, entityType: 'machines' }) }))
      .filter(({ text }) => looksLikeCode.test(text) || text === 'changed the farm’s records');
    expect(coded).toEqual([]);
  });
});
