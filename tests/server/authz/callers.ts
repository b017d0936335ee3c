// Who calls in the authorization matrix. Every farm route is addressed to one farm (the "farm");
// the dealers reach it through its links, the stranger manages another farm.

export const CALLERS = [
  'anonymous',
  'manager',
  'technician',
  'operator',
  'viewDealer',
  'serviceDealer',
  'unlinkedDealer',
  'stranger',
] as const;
export type Caller = (typeof CALLERS)[number];

export const SIGNED_IN = CALLERS.filter((c) => c !== 'anonymous');
export const DEALERS = ['viewDealer', 'serviceDealer', 'unlinkedDealer'] as const;
export const isDealer = (c: Caller) => (DEALERS as readonly string[]).includes(c);

/** What the farm's people and its two linked dealers are, in words for the test names. */
export const CALLER_WORDS: Record<Caller, string> = {
  anonymous: 'anonymous',
  manager: 'farm manager',
  technician: 'technician',
  operator: 'operator',
  viewDealer: 'advisor with a view link',
  serviceDealer: 'advisor with a service link',
  unlinkedDealer: 'advisor with no link (its link was revoked)',
  stranger: 'manager of another farm',
};

/** The answer a cell expects: any 2xx, or one exact refusal. */
export type Answer = '2xx' | 401 | 403 | 404 | 409 | 422;

/** Own ids: the farm's records; foreign ids: another organization's records in the same request. */
export type Side = 'own' | 'foreign';
