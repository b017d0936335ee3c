// The fluids of the parts forecast, summed once per kind and stock unit: engine oil given in
// litres on one farm and US gallons on another is one line, in the organization's units (L or
// US gal; kg or lb for greases). The sum is kept in the base unit (L, kg) and rounded once, at the
// end, so rounding never piles up over many services. A unit the converter does not know is not
// guessed at: its quantities stay on a line of their own, in that unit, marked as not converted.
import type { UnitSystem } from '../../shared/constants';
import { fromBaseUnit, toBaseUnit } from '../../shared/domain/stock-units';

/** A fluid as a task calls for it: kind, amount (`volume`, whatever it measures) and its unit. */
export interface ForecastFluid {
  kind: string;
  volume: number;
  unit: string;
}

export interface FluidLine {
  kind: string;
  /** the stock unit of its kind (L, gal, kg, lb), or the unit as given when it is not known */
  unit: string;
  /** summed amount in `unit`, three decimals */
  volume: number;
  /** false for a unit the converter does not know: summed only with the same unit */
  converted: boolean;
  /** the units the services gave it in, as written (e.g. ["kg", "lb"]) */
  summedFrom: string[];
  machines: number;
  services: number;
  firstNeededOn: string;
}

const round3 = (n: number) => Math.round(n * 1000) / 1000;
const kindKey = (kind: string) => kind.trim().toLowerCase();

interface Acc {
  kind: string;
  /** litres or kilograms for a known unit; the unit's own amount otherwise */
  total: number;
  known: { kind: 'volume' | 'mass' | 'count' } | null;
  unit: string;
  from: Set<string>;
  machines: Set<string>;
  services: number;
  firstNeededOn: string;
}

/** One fluid of one service, as a line's key and its amount in the line's own terms. */
function place(f: ForecastFluid) {
  const base = toBaseUnit(f.volume, f.unit);
  const unit = f.unit.trim();
  return base
    ? { key: `${kindKey(f.kind)}|${base.kind}`, amount: base.base, known: { kind: base.kind } }
    : { key: `${kindKey(f.kind)}|as:${unit.toLowerCase()}`, amount: f.volume, known: null };
}

/**
 * Sums fluids by kind (case and spaces aside) and stock kind (volume, mass), shown in the stock
 * unit of `units`; unknown units by kind and unit. Sorted soonest first, then by kind and unit.
 */
export function sumFluids(
  uses: { fluid: ForecastFluid; machineId: string; neededOn: string }[],
  units: UnitSystem,
): FluidLine[] {
  const lines = new Map<string, Acc>();
  for (const { fluid, machineId, neededOn } of uses) {
    const { key, amount, known } = place(fluid);
    const acc: Acc = lines.get(key) ?? {
      kind: fluid.kind.trim(),
      total: 0,
      known,
      unit: fluid.unit.trim(),
      from: new Set<string>(),
      machines: new Set<string>(),
      services: 0,
      firstNeededOn: neededOn,
    };
    acc.total += amount;
    acc.from.add(fluid.unit.trim());
    acc.machines.add(machineId);
    acc.services += 1;
    if (neededOn < acc.firstNeededOn) acc.firstNeededOn = neededOn;
    lines.set(key, acc);
  }
  return [...lines.values()]
    .map((a): FluidLine => {
      const shown = a.known
        ? fromBaseUnit(a.total, a.known.kind, units)
        : { quantity: a.total, unit: a.unit };
      return {
        kind: a.kind,
        unit: shown.unit,
        volume: round3(shown.quantity),
        converted: a.known !== null,
        summedFrom: [...a.from].sort(),
        machines: a.machines.size,
        services: a.services,
        firstNeededOn: a.firstNeededOn,
      };
    })
    .sort(
      (a, b) =>
        a.firstNeededOn.localeCompare(b.firstNeededOn) ||
        a.kind.localeCompare(b.kind) ||
        a.unit.localeCompare(b.unit),
    );
}
