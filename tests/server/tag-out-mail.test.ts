// A tag-out tells the farm's shop at once: one e-mail per manager and technician, queued in the
// outbox with the tag-out itself, once per tag-out event.
import { randomUUID } from 'node:crypto';
import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { createMember, signedInAgent } from '../support/factories';
import { Notification } from '../../server/models';
import { defaultChecklist } from '../../server/services/checklist-defaults';
import { TAG_OUT_MAIL_KIND } from '../../server/services/tag-out-mail';
import { api, app, dealerWorld } from './dealer-fixture';

const tractorItems = defaultChecklist('tractor').items;

/** A walkaround of T-01 with every item OK except those given. */
const walkaround = (machineId: string, meterValue: number, fails: string[], hoursAgo = 0) => ({
  machineId,
  clientId: randomUUID(),
  meterValue,
  performedAt: new Date(Date.now() - hoursAgo * 3_600_000).toISOString(),
  items: tractorItems.map((i) =>
    fails.includes(i.id)
      ? { itemId: i.id, result: 'fail', note: 'Loose on the left rear' }
      : { itemId: i.id, result: 'ok' },
  ),
});

const tagOutMail = () =>
  Notification.findAll({ where: { kind: TAG_OUT_MAIL_KIND }, order: [['recipient', 'ASC']] });

describe('tag-out e-mail', () => {
  beforeEach(resetDatabase);

  it('walkaround — a critical fail queues one e-mail to each manager and technician (not operators, not the dealer); a second fail while tagged out queues none', async () => {
    const w = await dealerWorld();
    const { org, machine, manager, tech, op } = w.serviced;
    const { user: secondTech } = await createMember(org, 'technician');
    const opAgent = await signedInAgent(app, op);
    const first = await opAgent
      .post(api(org.id, '/walkarounds'))
      .send(walkaround(machine.id, 1302, ['wheel-nuts'], 4));
    expect([first.status, first.body.error]).toEqual([201, undefined]);
    expect(first.body.taggedOut).toBe(true);

    const mail = await tagOutMail();
    expect(mail.map((m) => m.recipient).sort()).toEqual(
      [manager.email, tech.email, secondTech.email].map((e) => e.toLowerCase()).sort(),
    );
    expect(new Set(mail.map((m) => m.periodKey)).size).toBe(1);
    expect(mail.every((m) => m.status === 'queued' && m.organizationId === org.id)).toBe(true);
    expect(mail[0].subject).toBe('A-01 is tagged out: do not use it');
    expect(mail[0].textBody).toContain('Why: Critical fail on a walkaround: Wheel nuts: fail');
    expect(mail[0].textBody).toContain(`by ${op.name}`);
    expect(mail[0].textBody).toContain('returns it to service with a note of what was checked');
    expect(mail[0].textBody).toContain(`/o/${org.id}/machines/${machine.id}`);

    // an inspection that fails another critical item: the machine is tagged out already
    const again = await (
      await signedInAgent(app, tech)
    )
      .post(api(org.id, '/walkarounds'))
      .send({ ...walkaround(machine.id, 1304, ['hoses']), purpose: 'inspection' });
    expect([again.status, again.body.error]).toEqual([201, undefined]);
    expect(await tagOutMail()).toHaveLength(3);
  });

  it('each tag-out event is mailed once: a new tag-out after returning to service queues a new round', async () => {
    const { serviced } = await dealerWorld();
    const { org, machine, tech } = serviced;
    const techAgent = await signedInAgent(app, tech);
    const report = () =>
      techAgent
        .post(api(org.id, `/machines/${machine.id}/defects`))
        .send({ title: 'Brake pedal to the floor', severity: 'critical' });
    const first = await report();
    expect(first.body.taggedOut).toBe(true);
    expect(await tagOutMail()).toHaveLength(2);
    await techAgent
      .post(api(org.id, `/defects/${first.body.data.id}/close`))
      .send({ note: 'Master cylinder replaced, brakes bled' });
    expect(await tagOutMail(), 'closing the defect is no tag-out').toHaveLength(2);
    const back = await techAgent
      .post(api(org.id, `/machines/${machine.id}/return-to-service`))
      .send({ note: 'Brakes tested on the yard slope' });
    expect(back.status).toBe(200);
    await report();
    const mail = await tagOutMail();
    expect(mail).toHaveLength(4);
    expect(new Set(mail.map((m) => m.periodKey)).size).toBe(2);
  });

  it('two critical reports at once tag the machine out once and queue one round', async () => {
    const { serviced } = await dealerWorld();
    const { org, machine, tech, manager } = serviced;
    const agents = [await signedInAgent(app, tech), await signedInAgent(app, manager)];
    const answers = await Promise.all(
      agents.map((a, i) =>
        a
          .post(api(org.id, `/machines/${machine.id}/defects`))
          .send({ title: `ROPS pin missing (${i + 1})`, severity: 'critical' }),
      ),
    );
    expect(answers.map((r) => r.status)).toEqual([201, 201]);
    expect(await tagOutMail()).toHaveLength(2);
  });
});
