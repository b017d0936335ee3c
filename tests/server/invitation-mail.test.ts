import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { clearMail, mailTo } from '../support/mail';
import { api, app, TZ } from './dealer-fixture';

// A new user opening an invitation must see who asked, for which organization, and what they
// would be there: a link from an unknown sender with none of that looks like phishing.

describe('invitation e-mails — who invited you, to which organization, with which role', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('member invitation — names the inviting manager, the farm and the role, replies go to the manager', async () => {
    const org = await createOrganization({ name: 'Quillon Farm', timeZone: TZ });
    const { user: manager } = await createMember(org, 'manager', {
      name: 'Ada Quillon',
      email: 'ada@quillon.example',
    });
    const agent = await signedInAgent(app, manager);
    const sent = await agent
      .post(api(org.id, '/invitations'))
      .send({ email: 'newhand@quillon.example', name: 'New Hand', role: 'technician' });
    expect(sent.status).toBe(201);
    const mail = await mailTo('newhand@quillon.example');
    expect(mail.subject).toBe('You are invited to Quillon Farm on Hourstone');
    expect(mail.text).toContain(
      'Ada Quillon (ada@quillon.example) invited you to join Quillon Farm on Hourstone with the role of technician.',
    );
    expect(mail.html).toContain('Ada Quillon (ada@quillon.example)');
    expect(mail.html).toContain('<strong>technician</strong>');
    expect(mail.headers['reply-to']).toContain('ada@quillon.example');
  });

  it('customer invitation — names the advisor, their role and the dealer', async () => {
    const dealer = await createOrganization({ name: 'Marl Dealer', kind: 'dealer', timeZone: TZ });
    const { user: advisor } = await createMember(dealer, 'advisor', {
      name: 'Bo Marl',
      email: 'bo@marl.example',
    });
    const agent = await signedInAgent(app, advisor);
    const sent = await agent
      .post(api(dealer.id, '/customer-invitations'))
      .send({ email: 'owner@farm.example', message: '' });
    expect(sent.status).toBe(201);
    const mail = await mailTo('owner@farm.example');
    expect(mail.subject).toBe('Marl Dealer asks to see your machines on Hourstone');
    expect(mail.text).toContain('Bo Marl (bo@marl.example), service advisor at Marl Dealer, asks');
    // the access the dealer would get is the farm manager's choice; both are spelled out
    expect(mail.text).toMatch(/- View: .+\n- Service: /);
  });

  it('dealer granted by a farm — names the manager who granted it, the farm and the access', async () => {
    const dealer = await createOrganization({ name: 'Marl Dealer', kind: 'dealer', timeZone: TZ });
    await createMember(dealer, 'advisor', { name: 'Bo Marl', email: 'bo@marl.example' });
    const farm = await createOrganization({ name: 'Quillon Farm', timeZone: TZ });
    const { user: manager } = await createMember(farm, 'manager', {
      name: 'Ada Quillon',
      email: 'ada@quillon.example',
    });
    const agent = await signedInAgent(app, manager);
    const granted = await agent
      .post(api(farm.id, '/dealers'))
      .send({ email: 'bo@marl.example', access: 'service' });
    expect(granted.status).toBe(201);
    const mail = await mailTo('bo@marl.example');
    expect(mail.text).toContain(
      "Ada Quillon (ada@quillon.example), manager of Quillon Farm, has given Marl Dealer service access to Quillon Farm's machines on Hourstone.",
    );
  });
});
