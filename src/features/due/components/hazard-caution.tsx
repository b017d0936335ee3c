import { Icon } from '../../../components/ui/icons';
import { hazardLabel, SAFETY_DEFERRAL } from '../../../../shared/constants';

export { hazardLabel };

/** "Caution: hot fluids and battery. Follow the operator's manual, …" */
export function cautionText(hazards: readonly string[]): string {
  // mid-sentence: lower-case the first letter, but keep abbreviations such as PTO
  const names = hazards
    .map(hazardLabel)
    .map((n) => (/^[A-Z]{2}/.test(n) ? n : n[0].toLowerCase() + n.slice(1)));
  const list =
    names.length > 1 ? `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}` : names[0];
  return `Caution: ${list}. ${SAFETY_DEFERRAL}`;
}

/**
 * A small caution sign beside a task that involves a hazard. The sign is named (role="img" with
 * a title) so it reads out, and the title shows on hover; `withText` adds the words for phones,
 * where there is no hover.
 */
export function HazardCaution({
  hazards,
  withText = false,
}: {
  hazards: readonly string[];
  withText?: boolean;
}) {
  if (hazards.length === 0) return null;
  const text = cautionText(hazards);
  if (withText) {
    return (
      <p className="flex items-start gap-1.5 text-sm text-straw-900">
        <Icon name="alert" className="mt-0.5 size-4 text-straw-700" />
        <span>{text}</span>
      </p>
    );
  }
  return (
    <span title={text} className="inline-flex align-text-bottom text-straw-700">
      <Icon name="alert" title={text} className="size-4" />
    </span>
  );
}
