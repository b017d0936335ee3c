import type { ReactNode } from 'react';
import { SAFETY_DEFERRAL } from '../../../shared/constants';
import { hazardCautionEntries } from '../../lib/caution-text';
import { cx } from './cx';
import { Icon } from './icons';

interface CautionProps {
  /** the bold lead: "Caution: PTO shaft, Battery" */
  heading: string;
  /** words that run on after the heading, in the same paragraph */
  text?: string;
  /**
   * the hazards whose cautions to show in full, each "Label: what to do", in the words of the one
   * table (shared/domain/hazards.ts)
   */
  hazards?: readonly string[];
  /** end with the deferral to the operator's manual, local regulations and qualified practice */
  defer?: boolean;
  /**
   * `panel`: the full caution of a task or item, a named aside (a landmark a screen reader can
   * jump to); `line`: one sentence beside a task in a list, the same words always on screen;
   * `summary`: for a row of a long list (due list, dealer board, shop week) — the hazards named
   * on screen, what to do one tap or Enter away (a native disclosure, never a hover).
   */
  variant?: 'panel' | 'line' | 'summary';
  /** accessible name of a panel */
  label?: string;
  /** smaller type, for a panel inside a dense card */
  compact?: boolean;
  /** a line drawn in its own box, where it stands apart from the fields around it */
  boxed?: boolean;
  /** a line inside phrasing content (a label's description): rendered as a span */
  inline?: boolean;
  /** further blocks of a panel under the heading: the task's notes, a list */
  children?: ReactNode;
}

/**
 * The one caution of Hourstone, beside whatever can hurt someone (PTO, hydraulic pressure, raised
 * loads, stored energy…). Its words are always visible, never only a hover title; the icon is
 * decoration, the text carries the meaning.
 */
export function Caution({
  heading,
  text,
  hazards = [],
  defer = false,
  variant = 'panel',
  label = 'Caution',
  compact = false,
  boxed = false,
  inline = false,
  children,
}: CautionProps) {
  const entries = hazardCautionEntries(hazards);
  if (variant === 'summary' && entries.length)
    return <CautionSummary entries={entries} defer={defer} />;
  if (variant === 'line' || variant === 'summary') {
    const Line = inline ? 'span' : 'p';
    return (
      <Line
        className={cx(
          'flex items-start text-sm text-straw-900',
          boxed ? 'gap-2 rounded-lg border border-straw-400 bg-straw-50 p-3' : 'gap-1.5',
        )}
      >
        <Icon name="alert" className="mt-0.5 size-4 shrink-0 text-straw-700" />
        <span>
          <span className="font-bold">{heading}</span>
          {text ? ` ${text}` : null}
          {entries.map(({ hazard, label, advice }) => (
            <span key={hazard}>
              {' '}
              <span className="font-bold">{advice ? `${label}:` : `${label}.`}</span>
              {advice ? ` ${advice}` : null}
            </span>
          ))}
          {defer ? ` ${SAFETY_DEFERRAL}` : null}
        </span>
      </Line>
    );
  }
  return (
    <aside
      aria-label={label}
      className={cx(
        'flex rounded-lg border-2 border-l-8 border-straw-500 bg-straw-50 p-3 text-straw-900',
        compact ? 'gap-2.5 text-sm' : 'gap-3',
      )}
    >
      <Icon
        name="alert"
        className={cx('mt-0.5 shrink-0 text-straw-700', compact ? 'size-5' : 'size-6')}
      />
      <div className="flex min-w-0 flex-col gap-1">
        <p>
          <span className="font-black">{heading}</span>
          {text ? ` ${text}` : null}
        </p>
        {entries.length ? (
          <ul className="flex flex-col gap-1">
            {entries.map(({ hazard, label, advice }) => (
              <li key={hazard}>
                <span className="font-bold">{advice ? `${label}:` : `${label}.`}</span>
                {advice ? ` ${advice}` : null}
              </li>
            ))}
          </ul>
        ) : null}
        {children}
        {defer ? <p className="font-bold">{SAFETY_DEFERRAL}</p> : null}
      </div>
    </aside>
  );
}

/**
 * A list row's caution: "Caution: PTO shaft, Hot fluids — what to do" always on screen; the full
 * words of each hazard and the deferral open beneath it. The full panel stays on the task itself,
 * the walkaround, the visit card and the e-mails.
 */
function CautionSummary({
  entries,
  defer,
}: {
  entries: ReturnType<typeof hazardCautionEntries>;
  defer: boolean;
}) {
  return (
    <details className="group text-sm text-straw-900">
      <summary className="flex min-h-touch cursor-pointer list-none items-start gap-1.5 py-1 [&::-webkit-details-marker]:hidden">
        <Icon name="alert" className="mt-0.5 size-4 shrink-0 text-straw-700" />
        <span>
          <span className="font-bold">Caution:</span> {entries.map((e) => e.label).join(', ')}{' '}
          <span className="whitespace-nowrap text-straw-800 underline underline-offset-2 group-open:hidden">
            what to do
          </span>
          <span className="hidden whitespace-nowrap text-straw-800 underline underline-offset-2 group-open:inline">
            hide
          </span>
        </span>
      </summary>
      <ul className="ml-5.5 mt-1 flex flex-col gap-1 rounded-lg border border-straw-300 bg-straw-50 p-2">
        {entries.map(({ hazard, label, advice }) => (
          <li key={hazard}>
            <span className="font-bold">{advice ? `${label}:` : `${label}.`}</span>
            {advice ? ` ${advice}` : null}
          </li>
        ))}
        {defer ? <li className="font-bold">{SAFETY_DEFERRAL}</li> : null}
      </ul>
    </details>
  );
}
