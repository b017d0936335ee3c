import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { MachineOperator, Walkaround } from '../../server/models';
import { app, submission, tractorItems, yard } from './walkarounds-fixture';

describe('walkarounds — submitting', () => {
  beforeEach(resetDatabase);

  it('walkarounds — history newest first; operators see only the machines they may see; another farm 404', async () => {
    const y = await yard();
    await y.opAgent.post(`${y.base}/walkarounds`).send(submission(y.machine.id));
    const hidden = await createMachine(y.org, { fleetNumber: 'T-09' });
    const { user: someone } = await createMember(y.org, 'operator');
    await MachineOperator.create({
      organizationId: y.org.id,
      machineId: hidden.id,
      userId: someone.id,
    });
    await addReadings(hidden, [{ daysAgo: 3, value: 10 }]);
    const theirs = await signedInAgent(app, someone);
    const items = tractorItems.map((i) => ({ itemId: i.id, result: 'ok' }));
    expect(
      (
        await theirs
          .post(`${y.base}/walkarounds`)
          .send({ ...submission(hidden.id), meterValue: 12, items })
      ).status,
    ).toBe(201);
    const mine = await y.opAgent.get(`${y.base}/walkarounds`);
    expect(
      mine.body.data.map((w: { machine: { fleetNumber: string } }) => w.machine.fleetNumber),
    ).toEqual(['T-01']);
    const managerAgent = await signedInAgent(app, y.manager);
    const all = await managerAgent.get(`${y.base}/walkarounds`);
    expect(all.body.meta.total).toBe(2);
    const one = await managerAgent.get(`${y.base}/walkarounds/${mine.body.data[0].id}`);
    expect(one.status).toBe(200);
    expect(await Walkaround.count()).toBe(2);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(`${y.base}/walkarounds/${mine.body.data[0].id}`)).status).toBe(
      404,
    );
  });
});
