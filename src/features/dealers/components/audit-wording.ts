import type { AuditEvent } from '../api/types';

// The farm's audit log in plain words. The server records actions as codes
// ("machine.return_to_service") and a dealer's reads by the part of the API they reached
// ("machines/service-records/prefill"); a person reads a sentence after the actor's name.

/** What each audited action reads as, after "<name> (<dealer>)". */
const ACTIONS: Record<string, string> = {
  'dealer.reminder': 'sent a reminder about services coming due',
  'booking.propose': 'proposed a booking',
  'booking.accept': 'accepted a booking',
  'booking.decline': 'declined a booking',
  'booking.cancel': 'withdrew a booking',
  'service.plan': 'planned a service',
  'service.complete': 'recorded a service',
  'service.update': 'edited a service record',
  'service.cancel': 'cancelled a planned service',
  'service.attach': 'added an attachment to a service record',
  'service.detach': 'removed an attachment from a service record',
  'machine.create': 'added a machine',
  'machine.update': 'changed a machine’s details',
  'machine.apply_class': 'gave a machine a class of the service library',
  'machine.spec_sheet_update': 'changed a machine’s spec sheet',
  'machine.photo': 'changed a machine’s photo',
  'machine.tag_out': 'tagged a machine out',
  'machine.return_to_service': 'returned a machine to service',
  'machine.clear_tag_out': 'cleared a machine’s tag-out',
  'machine.restrict': 'restricted a machine’s use',
  'machine.lift_restriction': 'lifted a machine’s restriction',
  'defect.report': 'reported a defect',
  'defect.update': 'updated a defect',
  'defect.close': 'closed a defect',
  'walkaround.create': 'did a walkaround',
  'reading.correct': 'corrected a meter reading',
  'reading.delete': 'deleted a meter reading',
  'meter.replace': 'recorded a meter replacement',
  'task.create': 'added a task to a machine’s schedule',
  'task.create_from_template': 'added a task to a machine’s schedule from a template',
  'task.create_from_library': 'added a task to a machine’s schedule from the service library',
  'task.update': 'changed a task of a machine’s schedule',
  'task.delete': 'removed a task from a machine’s schedule',
  'task.last_done': 'set when a task was last done',
  'task.count_from_now': 'restarted a task’s count from now',
  'task.daily_care_done': 'signed off a daily-care task in a walkaround',
  'template.create': 'saved a schedule template',
  'checklist.create': 'added a walkaround checklist',
  'checklist.update': 'changed a walkaround checklist',
  'checklist.delete': 'removed a walkaround checklist',
  'dealer_link.request': 'asked for dealer access',
  'dealer_link.withdraw': 'withdrew a dealer access request',
  'dealer_link.accept': 'accepted dealer access',
  'dealer_link.grant': 'gave a dealer access',
  'dealer_link.update': 'changed a dealer’s access',
  'dealer_link.revoke': 'ended a dealer’s access',
  'invitation.create': 'invited someone to the team',
  'invitation.accept': 'joined the team',
  'membership.update': 'changed a team member’s role',
  'membership.remove': 'removed someone from the team',
  'organization.create': 'created the farm',
  'organization.update': 'changed the farm’s settings',
  'organization.digest_hour': 'changed the digest hour',
  'organization.export': 'downloaded the farm’s data',
  'organization.delete': 'deleted the farm',
  'demo.load': 'loaded the demo',
  'user.sign_up': 'signed up',
  'user.update': 'changed their name',
  'user.email_change_request': 'asked to change their e-mail address',
  'user.email_change': 'changed their e-mail address',
  'user.delete': 'deleted their account',
  'password.change': 'changed their password',
  'password.reset': 'reset their password',
};

/** What a dealer's read reached, by the API path below the organization it names. */
const READ_OF: Record<string, string> = {
  organization: 'the farm',
  machines: 'the fleet',
  'machines/readings': 'a machine’s readings',
  'machines/due': 'a machine’s due services',
  'machines/tasks': 'a machine’s schedule',
  'machines/spec-sheet': 'a machine’s spec sheet',
  'machines/photo': 'a machine’s photo',
  'machines/service-records': 'a machine’s service history',
  'machines/service-records/prefill': 'a machine’s due tasks to start a service record',
  'machines/measurements': 'a machine’s measurements',
  'machines/measurements/series': 'a machine’s measurements',
  'service-records': 'a service record',
  'service-records/attachments': 'a service attachment',
  'readings/latest': 'the latest readings',
  due: 'the due list',
};

/** The sentence after the actor's name; never a code, even for an action added later. */
export function describeAuditEvent(e: Pick<AuditEvent, 'action' | 'entityType'>): string {
  if (e.action === 'dealer.read')
    return `looked at ${READ_OF[e.entityType] ?? 'the farm’s records'}`;
  return ACTIONS[e.action] ?? 'changed the farm’s records';
}
