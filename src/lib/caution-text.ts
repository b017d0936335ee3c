import { hazardLabel } from '../../shared/constants';

export { hazardCautionEntries, hazardCautionText } from '../../shared/domain/hazards';

// The words of a caution's hazards, for the one caution component (src/components/ui/caution.tsx).

/** "PTO shaft, Battery": the hazards' labels as a list. */
export const hazardNames = (hazards: readonly string[]): string =>
  hazards.map(hazardLabel).join(', ');

/** "PTO shaft, hot fluids and battery": the hazards inside a sentence (abbreviations kept). */
export function hazardSentence(hazards: readonly string[]): string {
  // mid-sentence: lower-case the first letter, but keep abbreviations such as PTO
  const names = hazards
    .map(hazardLabel)
    .map((n) => (/^[A-Z]{2}/.test(n) ? n : n[0].toLowerCase() + n.slice(1)));
  return names.length > 1
    ? `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`
    : (names[0] ?? '');
}
