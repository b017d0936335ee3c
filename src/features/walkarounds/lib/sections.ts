import {
  CHECKLIST_PHASES,
  CHECKLIST_PHASE_LABELS,
  type ChecklistPhase,
} from '../../../../shared/schemas/walkarounds';
import type { ChecklistItem } from '../api/types';
import type { DraftAnswer } from './draft';

// The checklist is walked in its phases: round the machine before start (engine off, key out),
// then from the seat with the engine running. A long phase is split into runs of a few items,
// so a finished run can fold away and the phone shows what is left.

/** Most items in one run: about one phone screen and a half of cards. */
export const SECTION_SIZE = 6;

export interface ChecklistSection {
  key: string;
  phase: ChecklistPhase;
  /** "Before start — engine off, key out", with "· items 7–12" when the phase is in runs */
  title: string;
  /** how to stand before the phase's first run ("Walk round with the engine off…"), else null */
  intro: string | null;
  /** each item with its place in the whole checklist as walked (1-based) */
  items: { item: ChecklistItem; position: number }[];
}

const PHASE_INTRO: Record<ChecklistPhase, string> = {
  before_start:
    'Walk round with the engine off, the key in your pocket and everything lowered to the ground.',
  running:
    'Sit in and belt up, parking brake on; start the engine and check these before you move off, in a clear area.',
};

// A checklist kept on the phone before items had phases has none: it is walked before start.
const phaseOf = (item: ChecklistItem): ChecklistPhase =>
  (item.phase as ChecklistPhase | undefined) ?? 'before_start';

/**
 * Run lengths for a phase of `n` items: as few runs as SECTION_SIZE allows, as even as can be
 * (20 items: 5, 5, 5, 5 rather than 6, 6, 6, 2).
 */
function runLengths(n: number): number[] {
  const runs = Math.ceil(n / SECTION_SIZE);
  return Array.from({ length: runs }, (_, i) => Math.floor(n / runs) + (i < n % runs ? 1 : 0));
}

/** The checklist by phase, before start first, each phase in its own order and in even runs. */
export function checklistSections(items: readonly ChecklistItem[]): ChecklistSection[] {
  const sections: ChecklistSection[] = [];
  let position = 1;
  for (const phase of CHECKLIST_PHASES) {
    const inPhase = items.filter((item) => phaseOf(item) === phase);
    const lengths = runLengths(inPhase.length);
    let start = 0;
    for (const length of lengths) {
      const run = inPhase.slice(start, start + length);
      const first = position;
      const last = position + run.length - 1;
      const label = CHECKLIST_PHASE_LABELS[phase];
      sections.push({
        key: `${phase}-${first}`,
        phase,
        title:
          lengths.length === 1
            ? label
            : `${label} · ${first === last ? `item ${first}` : `items ${first}–${last}`}`,
        intro: start === 0 ? PHASE_INTRO[phase] : null,
        items: run.map((item, i) => ({ item, position: first + i })),
      });
      start += length;
      position = last + 1;
    }
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
