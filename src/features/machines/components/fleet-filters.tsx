import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import {
  CATEGORY_LABELS,
  DUE_STATUS_LABELS,
  DUE_STATUSES,
  MACHINE_CATEGORIES,
  MACHINE_STATUSES,
  MACHINE_STATUS_LABELS,
} from '../../../../shared/constants';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import type { MachineFilters } from '../api/types';
import { hasNarrowingFilters } from '../lib/fleet-filters';

type FilterChange = Partial<Pick<MachineFilters, 'category' | 'status' | 'dueStatus' | 'q'>>;

const withAll = <T extends string>(
  values: readonly T[],
  labels: Record<T, string>,
  all: string,
) => [{ value: '', label: all }, ...values.map((value) => ({ value, label: labels[value] }))];

const CATEGORY_OPTIONS = withAll(MACHINE_CATEGORIES, CATEGORY_LABELS, 'All categories');
const STATUS_OPTIONS = withAll(MACHINE_STATUSES, MACHINE_STATUS_LABELS, 'Any status');
const DUE_OPTIONS = withAll(DUE_STATUSES, DUE_STATUS_LABELS, 'Any due state');

// Typing waits this long before asking the server, so a fleet number is one request, not five.
const SEARCH_DELAY_MS = 300;

const CLEARED: FilterChange = {
  category: undefined,
  status: undefined,
  dueStatus: undefined,
  q: undefined,
};

interface FleetFiltersProps {
  filters: MachineFilters;
  onChange: (change: FilterChange) => void;
  /** phones: the selects fold away behind a button so the machines start on the first screen */
  collapsible: boolean;
  /** shown with the selects (the sort picker on phones) */
  extra?: ReactNode;
}

export function FleetFilters({ filters, onChange, collapsible, extra }: FleetFiltersProps) {
  const [search, setSearch] = useState(filters.q ?? '');
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const latest = useRef(onChange);
  useEffect(() => {
    latest.current = onChange;
  });

  // The URL can change from outside (back button, "Clear filters"): follow it.
  useEffect(() => setSearch(filters.q ?? ''), [filters.q]);

  useEffect(() => {
    if (search.trim() === (filters.q ?? '')) return;
    const timer = window.setTimeout(
      () => latest.current({ q: search.trim() || undefined }),
      SEARCH_DELAY_MS,
    );
    return () => window.clearTimeout(timer);
  }, [search, filters.q]);

  const active = [filters.category, filters.status, filters.dueStatus].filter(Boolean).length;
  const showSelects = !collapsible || open;

  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[minmax(0,1.4fr)_repeat(3,minmax(0,1fr))]">
      <div role="search" aria-label="Fleet">
        <TextField
          label="Search fleet"
          type="search"
          placeholder="Fleet number, name, make or model"
          value={search}
          autoComplete="off"
          spellCheck={false}
          onChange={(event) => setSearch(event.target.value)}
          onKeyDown={(event) => {
            if (event.key === 'Enter') onChange({ q: search.trim() || undefined });
          }}
        />
      </div>
      {collapsible ? (
        <div className="sm:self-end">
          <Button
            variant="secondary"
            aria-expanded={open}
            aria-controls={panelId}
            className="w-full"
            onClick={() => setOpen((o) => !o)}
          >
            {open
              ? 'Hide filters'
              : active
                ? `Filters and sort (${active} on)`
                : 'Filters and sort'}
          </Button>
        </div>
      ) : null}
      {showSelects ? (
        <div id={panelId} className="contents">
          <SelectField
            label="Category"
            options={CATEGORY_OPTIONS}
            value={filters.category ?? ''}
            onChange={(event) =>
              onChange({ category: (event.target.value || undefined) as FilterChange['category'] })
            }
          />
          <SelectField
            label="Status"
            options={STATUS_OPTIONS}
            value={filters.status ?? ''}
            onChange={(event) =>
              onChange({ status: (event.target.value || undefined) as FilterChange['status'] })
            }
          />
          <SelectField
            label="Due state"
            options={DUE_OPTIONS}
            value={filters.dueStatus ?? ''}
            onChange={(event) =>
              onChange({
                dueStatus: (event.target.value || undefined) as FilterChange['dueStatus'],
              })
            }
          />
          {extra}
        </div>
      ) : null}
      {hasNarrowingFilters(filters) ? (
        <div className="sm:col-span-2 lg:col-span-4">
          <Button variant="ghost" icon="close" onClick={() => onChange(CLEARED)}>
            Clear filters
          </Button>
        </div>
      ) : null}
    </div>
  );
}
