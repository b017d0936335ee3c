import { HAZARD_TABLE } from '../../../../shared/domain/hazards';
import { HAZARDS } from '../../../../shared/schemas/schedule';

// The checklist editor's hazard choices, in the words of the one table (shared/domain/hazards.ts).
export const HAZARD_OPTIONS = HAZARDS.map((value) => ({ value, label: HAZARD_TABLE[value].label }));
