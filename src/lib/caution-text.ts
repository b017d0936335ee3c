import { hazardLabel } from '../../shared/constants';

export {
  hazardCautionEntries,
  hazardCautionText,
  hazardSentence,
} from '../../shared/domain/hazards';

// The words of a caution's hazards, for the one caution component (src/components/ui/caution.tsx).

/** "PTO shaft, Battery": the hazards' labels as a list. */
export const hazardNames = (hazards: readonly string[]): string =>
  hazards.map(hazardLabel).join(', ');
