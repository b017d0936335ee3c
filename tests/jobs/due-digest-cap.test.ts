import { beforeEach, describe, expect, it } from 'vitest';
import { ServiceTask } from '../../server/models';
import { refreshMachineForecast } from '../../server/services/forecast';
import { capDigestTasks, type DigestTask } from '../../server/services/digest-render';
import { DIGEST_TASK_CAP } from '../../shared/schemas/notifications';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization } from '../support/factories';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import { handWorkedFarm } from './reminders-fixture';
import { APP_URL, mailFor, NOW, runDigest, sendAll } from './due-digest-fixture';

// Provenance: derived — the hand-worked farm of reminders-fixture.ts carries 5 digest tasks
// (oil overdue; air filter and knotter due soon; fuel filters and grease pins coming up). Each of
// the 200 checks added here is done at 1,000 − n h every 250 h, so due at 1,250 − n h on a meter
// reading 1,300 h: 50 + n h over, overdue. 201 overdue + 2 due soon + 2 coming up = 205 tasks,
// 5 past the cap of 200; the due list's order puts every overdue task first, so the 200 listed
// are all overdue and the 5 left are 1 overdue, 2 due soon and 2 coming up.
describe('due digest — the cap on a large farm', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });

  it('digest — 205 tasks due: lists the first 200 (the overdue ones), counts every task in the subject, says how many more of each kind and links to the full due list', async () => {
    expect(DIGEST_TASK_CAP).toBe(200);
    const org = await createOrganization({ name: 'Test Farm', timeZone: 'America/Chicago' });
    const { user } = await createMember(org, 'manager', { name: 'Ann Manager' });
    const { tractor } = await handWorkedFarm(org, NOW);
    await ServiceTask.bulkCreate(
      Array.from({ length: 200 }, (_, i) => ({
        organizationId: org.id,
        machineId: tractor.id,
        name: `Overdue check ${i + 1}`,
        intervalMeter: 250,
        intervalDays: null,
        warnMeter: 25,
        lastDoneMeter: 1000 - (i + 1),
        lastDoneOn: null,
        position: 10 + i,
      })),
    );
    await refreshMachineForecast(tractor.id, org.id);

    expect(await runDigest(NOW)).toEqual({ organizations: 1, queued: 1 });
    await sendAll();
    const [mail] = mailFor(await caughtMail(), user.email);
    expect(mail.subject).toBe('Due list: Test Farm — 201 overdue, 2 due soon, 2 coming up');
    const text = mail.text;
    expect(text).toContain(
      'here is what is due on Tue, Apr 7, 2026: 201 overdue, 2 due soon, 2 coming up',
    );
    expect(text.match(/^ {2}- Overdue: /gm)).toHaveLength(200);
    expect(text).not.toContain('Due soon: ');
    expect(text).not.toContain('Coming up: ');
    expect(text).toContain(
      `This e-mail lists the first 200 tasks, most pressing first; 5 more (1 overdue, 2 due soon, 2 coming up) are on the full due list: ${APP_URL}/o/${org.id}\n`,
    );
    expect(mail.html).toContain(
      `5 more (1 overdue, 2 due soon, 2 coming up) are on the full due list: <a href="${APP_URL}/o/${org.id}"`,
    );
    // the listed tasks' cautions still come in full (the oil change, if listed, is hot fluids)
    expect(text).toContain('Follow the operator');
  });

  // Hand-worked: tasks in the due list's order, sections as the digest names them.
  const task = (section: DigestTask['section'], n: number) =>
    ({ taskId: `t${n}`, section }) as unknown as DigestTask;

  it('cap — at the cap nothing is cut; one past it, the last task is counted under its section', () => {
    const atCap = Array.from({ length: 200 }, (_, i) => task('overdue', i));
    expect(capDigestTasks(atCap)).toMatchObject({
      moreTotal: 0,
      all: { overdue: 200, due_soon: 0, coming_up: 0 },
    });
    expect(capDigestTasks(atCap).listed).toHaveLength(200);
    const onePast = [...atCap.slice(0, 199), task('due_soon', 199), task('coming_up', 200)];
    const capped = capDigestTasks(onePast);
    expect(capped.listed.map((t) => t.taskId)).toEqual(atCap.map((t) => t.taskId));
    expect(capped).toMatchObject({
      moreTotal: 1,
      more: { overdue: 0, due_soon: 0, coming_up: 1 },
      all: { overdue: 199, due_soon: 1, coming_up: 1 },
    });
  });
});
