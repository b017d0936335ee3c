import { Link } from 'react-router-dom';
import type { FirstRunChecklist, FirstRunStep } from '../../../../shared/schemas/onboarding';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import { cx } from '../../../components/ui/cx';
import { isApiError } from '../../../lib/api-client';
import { useDismissFirstRunChecklist, useFirstRunChecklist } from '../api/first-run-checklist';

/** Where each step is done; the route module builds the addresses (paths.ts). */
export interface FirstRunLinks {
  importFleet: string;
  addMachine: string;
  fleet: string;
  machine: (machineId: string) => string;
  team: string;
  dealers: string;
  reminders: string;
}

type Step = FirstRunChecklist['steps'][number];

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function stepText(step: Step): { title: string; detail: string | null } {
  const left = step.remaining ?? 0;
  const texts: Record<FirstRunStep, { title: string; detail: string | null }> = {
    machines: { title: 'Add or import your machines', detail: null },
    schedules: {
      title: 'Put a service schedule on each machine',
      detail: left ? `${plural(left, 'machine has', 'machines have')} no schedule yet` : null,
    },
    lastDone: {
      title: 'Set when each task was last done',
      detail: left ? `${plural(left, 'task has', 'tasks have')} no known last service` : null,
    },
    team: { title: 'Invite your team', detail: null },
    dealer: { title: 'Link your dealer', detail: null },
    digestHour: { title: 'Choose the hour of the daily digest', detail: null },
  };
  return texts[step.key];
}

function stepLinks(step: Step, links: FirstRunLinks): { label: string; href: string }[] {
  const machine = step.machineId ? links.machine(step.machineId) : links.fleet;
  switch (step.key) {
    case 'machines':
      return [
        { label: 'Import fleet', href: links.importFleet },
        { label: 'Add a machine', href: links.addMachine },
      ];
    case 'schedules':
      return [{ label: 'Apply a schedule', href: machine }];
    case 'lastDone':
      return [{ label: 'Set last done', href: machine }];
    case 'team':
      return [{ label: 'Invite people', href: links.team }];
    case 'dealer':
      return [{ label: 'Link a dealer', href: links.dealers }];
    case 'digestHour':
      return [{ label: 'Choose the hour', href: links.reminders }];
  }
}

/**
 * The first steps of a new farm, on its dashboard for managers: each ticked from the farm's
 * data, each linking to where it is done, and put away for good with one button.
 */
export function FirstRunChecklistPanel({
  orgId,
  enabled,
  links,
}: {
  orgId: string;
  /** a farm's manager: nobody else is shown (or asked for) the checklist */
  enabled: boolean;
  links: FirstRunLinks;
}) {
  const checklist = useFirstRunChecklist(orgId, enabled);
  const dismiss = useDismissFirstRunChecklist(orgId);
  if (!enabled || !checklist.data?.offered) return null;
  const { steps } = checklist.data;
  const done = steps.filter((s) => s.done).length;

  return (
    <section
      aria-labelledby="first-run-title"
      className="mb-6 flex flex-col gap-3 rounded-xl border border-field-200 bg-white p-4 shadow-card sm:p-6"
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h2 id="first-run-title" className="text-xl font-black text-field-950">
            First steps
          </h2>
          <p className="text-field-700">
            {done} of {steps.length} done. Each step ticks itself once the work is done.
          </p>
        </div>
        <Button variant="ghost" pending={dismiss.isPending} onClick={() => dismiss.mutate()}>
          Put this list away
        </Button>
      </div>
      {dismiss.error ? (
        <Alert>
          {isApiError(dismiss.error) ? dismiss.error.message : 'Could not save. Try again.'}
        </Alert>
      ) : null}
      <ol aria-label="First steps" className="flex flex-col divide-y divide-field-100">
        {steps.map((step) => {
          const { title, detail } = stepText(step);
          return (
            <li key={step.key} className="flex flex-wrap items-center justify-between gap-2 py-2.5">
              <div className="flex items-start gap-2">
                <span
                  className={cx(
                    'mt-0.5 flex size-6 shrink-0 items-center justify-center rounded-full border-2',
                    step.done ? 'border-clover-600 bg-clover-600 text-white' : 'border-field-300',
                  )}
                >
                  {step.done ? <Icon name="check" className="size-4" /> : null}
                </span>
                <div>
                  <p className={cx('font-bold', step.done ? 'text-field-600' : 'text-field-950')}>
                    {title}
                    {step.done ? null : <span className="sr-only"> (to do)</span>}
                  </p>
                  {step.done ? (
                    <p className="text-sm text-clover-800">Done</p>
                  ) : detail ? (
                    <p className="text-sm text-field-700">{detail}</p>
                  ) : null}
                </div>
              </div>
              {step.done ? null : (
                <div className="flex flex-wrap gap-3">
                  {stepLinks(step, links).map((link) => (
                    <Link
                      key={link.label}
                      to={link.href}
                      className="inline-flex min-h-touch items-center font-bold text-field-800 underline underline-offset-2"
                    >
                      {link.label}
                    </Link>
                  ))}
                </div>
              )}
            </li>
          );
        })}
      </ol>
    </section>
  );
}
