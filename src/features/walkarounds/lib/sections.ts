import type { ChecklistItem } from '../api/types';
import type { DraftAnswer } from './draft';

// A long checklist is walked in runs of a few items, so a finished run can fold away and the
// phone shows what is left. The checklist has no sections of its own: they are runs of its order.

/** Items per section: about one phone screen and a half of cards. */
export const SECTION_SIZE = 6;

export interface ChecklistSection {
  key: string;
  /** "Items 7–12" */
  title: string;
  /** each item with its place in the whole checklist (1-based) */
  items: { item: ChecklistItem; position: number }[];
}

/** The checklist in runs of SECTION_SIZE items, in its own order. */
export function checklistSections(items: readonly ChecklistItem[]): ChecklistSection[] {
  const sections: ChecklistSection[] = [];
  for (let start = 0; start < items.length; start += SECTION_SIZE) {
    const run = items.slice(start, start + SECTION_SIZE);
    const first = start + 1;
    const last = start + run.length;
    sections.push({
      key: `${first}-${last}`,
      title: first === last ? `Item ${first}` : `Items ${first}–${last}`,
      items: run.map((item, i) => ({ item, position: first + i })),
    });
  }
  return sections;
}

export interface SectionProgress {
  answered: number;
  total: number;
  /** answered Attention or Fail: the section stays open for the notes and photos */
  findings: number;
  /** the unanswered items, in order */
  unanswered: ChecklistItem[];
}

/** How far a section is answered. */
export function sectionProgress(
  section: ChecklistSection,
  answers: Readonly<Record<string, DraftAnswer | undefined>>,
): SectionProgress {
  const results = section.items.map(({ item }) => answers[item.id]?.result ?? null);
  return {
    answered: results.filter(Boolean).length,
    total: section.items.length,
    findings: results.filter((r) => r === 'attention' || r === 'fail').length,
    unanswered: section.items.filter((_, i) => !results[i]).map(({ item }) => item),
  };
}

/**
 * "Mark the rest OK" is offered only once every item still unanswered has been on screen: a tick
 * for items nobody looked at would be a careless tick. Fails and attentions are never bulk-set.
 */
export const offersRestOk = (progress: SectionProgress, seen: ReadonlySet<string>) =>
  progress.unanswered.length > 0 && progress.unanswered.every((item) => seen.has(item.id));
