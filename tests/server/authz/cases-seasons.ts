// How the matrix calls the season hours routes (issue 17): the list of the farm's season use, and
// a machine's plan for a season set and removed (the world's machine; a plan changes only its
// season_plans and its forecast, which the refused cells must leave as they were).
import type { Case } from './cases-fleet';
import { onFarm, onMachine } from './cases-fleet';

export const SEASON_CASES: Record<string, Case> = {
  'GET /organizations/{orgId}/season-hours': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), query: { year: '2026' } }),
  },
  'PUT /organizations/{orgId}/machines/{machineId}/season-plans/{year}': {
    ids: 'path',
    build: (c) => ({ params: { ...onMachine(c), year: '2027' }, body: { value: 420 } }),
  },
  'DELETE /organizations/{orgId}/machines/{machineId}/season-plans/{year}': {
    ids: 'path',
    build: (c) => ({ params: { ...onMachine(c), year: '2027' } }),
  },
};
