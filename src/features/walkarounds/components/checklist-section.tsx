import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import { offersRestOk, type ChecklistSection, type SectionProgress } from '../lib/sections';

// An item counts as shown once half of its card has been on screen.
const SHOWN_RATIO = 0.5;

/**
 * One phase of the checklist (before start, or in the seat with the engine running), or one run
 * of a long phase. It folds away once every item is answered and none found a problem
 * (a section with an Attention or Fail stays open for its notes and photos; one with a missing
 * answer opens again). "Mark the rest of this section OK" appears only after each item still
 * unanswered has been shown.
 */
export function ChecklistSectionView({
  section,
  progress,
  hasErrors,
  seen,
  onSeen,
  onRestOk,
  children,
}: {
  section: ChecklistSection;
  progress: SectionProgress;
  hasErrors: boolean;
  seen: ReadonlySet<string>;
  onSeen: (itemId: string) => void;
  onRestOk: () => void;
  /** the section's item cards (li elements with data-item-id) */
  children: ReactNode;
}) {
  const id = useId();
  const listRef = useRef<HTMLOListElement>(null);
  const done = progress.answered === progress.total && progress.findings === 0;
  // null: folded when done; a tap on the heading overrides that until the answers change
  const [openByHand, setOpenByHand] = useState<boolean | null>(null);
  const answered = progress.answered;
  useEffect(() => setOpenByHand(null), [answered]);
  const open = hasErrors || (openByHand ?? !done);

  useEffect(() => {
    const list = listRef.current;
    if (!list || !open || typeof IntersectionObserver === 'undefined') return;
    const observer = new IntersectionObserver(
      (entries) => {
        for (const entry of entries) {
          const tall =
            entry.rootBounds && entry.intersectionRect.height >= entry.rootBounds.height / 2;
          if (entry.isIntersecting && (entry.intersectionRatio >= SHOWN_RATIO || tall)) {
            const itemId = (entry.target as HTMLElement).dataset.itemId;
            if (itemId) onSeen(itemId);
          }
        }
      },
      { threshold: [SHOWN_RATIO, 1] },
    );
    list.querySelectorAll('[data-item-id]').forEach((el) => observer.observe(el));
    return () => observer.disconnect();
  }, [open, onSeen]);

  const summary = `${progress.answered} of ${progress.total} answered${
    done ? ' · all OK' : progress.findings ? ` · ${progress.findings} to report` : ''
  }`;
  const restOk = offersRestOk(progress, seen);

  return (
    <section aria-labelledby={`${id}-title`} className="flex flex-col gap-3">
      <h2 id={`${id}-title`} className="text-base font-black text-field-900">
        <button
          type="button"
          aria-expanded={open}
          aria-controls={`${id}-items`}
          onClick={() => setOpenByHand(!open)}
          className="flex min-h-12 w-full items-center justify-between gap-2 rounded-lg border border-field-200 bg-oat-100 px-3 text-left"
        >
          <span>
            {section.title}
            <span className="block text-sm font-bold text-field-600">{summary}</span>
          </span>
          <span className="flex items-center gap-1 text-sm font-bold text-field-700">
            {done ? <Icon name="check" className="size-5 text-clover-700" /> : null}
            {open ? 'Hide' : 'Show'}
          </span>
        </button>
      </h2>
      <div id={`${id}-items`} hidden={!open} className="flex flex-col gap-4">
        {section.intro ? <p className="font-bold text-field-800">{section.intro}</p> : null}
        <ol ref={listRef} aria-label={section.title} className="flex flex-col gap-4">
          {children}
        </ol>
        {restOk ? (
          <Button variant="secondary" className="min-h-12 w-full" onClick={onRestOk}>
            Mark the rest of this section OK ({progress.unanswered.length})
          </Button>
        ) : progress.unanswered.length > 1 ? (
          <p className="text-sm text-field-600">
            Scroll through each item of this section to mark the rest OK together.
          </p>
        ) : null}
      </div>
    </section>
  );
}
