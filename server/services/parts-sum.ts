// The parts forecast's arithmetic, kept pure (no database) so it is tested against hand-worked
// examples: consumable parts summed by part number, fluids by kind in one stock unit each
// (fluid-sum.ts), per customer and in total. Wear parts (belts, tines, knives) are listed apart,
// as parts to inspect on named machines: a service replaces one only when it is worn, so no
// quantity of them is ever summed as needed.
import type { UnitSystem } from '../../shared/constants';
import { sumFluids, type FluidLine, type ForecastFluid } from './fluid-sum';

export type { FluidLine } from './fluid-sum';

/** A machine as the forecast names it. */
export interface ForecastMachine {
  id: string;
  fleetNumber: string;
  name: string;
}

/** One due service as the forecast needs it: who, which machine, when, and its lists. */
export interface ForecastService {
  customer: { id: string; name: string };
  machine: ForecastMachine;
  /** ISO local date the parts are first needed (today for an overdue service) */
  neededOn: string;
  /** a wear part (belt, tine, knife) is replaced only when worn: never summed as needed */
  parts: { partNumber: string; description: string; quantity: number; wearPart?: boolean }[];
  fluids: ForecastFluid[];
}

export interface PartLine {
  partNumber: string;
  description: string;
  /** summed over the services (a count: parts carry no unit) */
  quantity: number;
  /** distinct machines that need it */
  machines: number;
  /** services (task visits) that need it */
  services: number;
  firstNeededOn: string;
}

/** A wear part to inspect — replaced when worn — with the machines it sits on; no quantity. */
export interface WearLine {
  partNumber: string;
  description: string;
  machines: ForecastMachine[];
  services: number;
  /** ISO local date of the first service that inspects it */
  firstNeededOn: string;
}

export interface PartsSummary {
  parts: PartLine[];
  fluids: FluidLine[];
  wearParts: WearLine[];
}

const round3 = (n: number) => Math.round(n * 1000) / 1000;
const partKey = (partNumber: string) => partNumber.trim().toUpperCase();
// a wear part may have no number yet (the library's have none): then its description names it
const wearKey = (p: { partNumber: string; description: string }) =>
  p.partNumber.trim()
    ? `#${partKey(p.partNumber)}`
    : `~${p.description.trim().toLowerCase().replace(/\s+/g, ' ')}`;

function sumConsumables(services: ForecastService[]): PartLine[] {
  const lines = new Map<string, { line: PartLine; machines: Set<string> }>();
  for (const s of services)
    for (const p of s.parts) {
      if (p.wearPart) continue;
      const key = partKey(p.partNumber);
      const acc = lines.get(key) ?? {
        line: {
          partNumber: p.partNumber.trim(),
          description: p.description,
          quantity: 0,
          machines: 0,
          services: 0,
          firstNeededOn: s.neededOn,
        },
        machines: new Set<string>(),
      };
      acc.line.quantity = round3(acc.line.quantity + p.quantity);
      acc.line.services += 1;
      if (s.neededOn < acc.line.firstNeededOn) acc.line.firstNeededOn = s.neededOn;
      if (!acc.line.description && p.description) acc.line.description = p.description;
      acc.machines.add(s.machine.id);
      lines.set(key, acc);
    }
  return [...lines.values()]
    .map((a) => ({ ...a.line, machines: a.machines.size }))
    .sort(
      (a, b) =>
        a.firstNeededOn.localeCompare(b.firstNeededOn) ||
        partKey(a.partNumber).localeCompare(partKey(b.partNumber)),
    );
}

function listWearParts(services: ForecastService[]): WearLine[] {
  const lines = new Map<string, { line: WearLine; machines: Map<string, ForecastMachine> }>();
  for (const s of services)
    for (const p of s.parts) {
      if (!p.wearPart) continue;
      const key = wearKey(p);
      const acc = lines.get(key) ?? {
        line: {
          partNumber: p.partNumber.trim(),
          description: p.description.trim(),
          machines: [],
          services: 0,
          firstNeededOn: s.neededOn,
        },
        machines: new Map<string, ForecastMachine>(),
      };
      acc.line.services += 1;
      if (s.neededOn < acc.line.firstNeededOn) acc.line.firstNeededOn = s.neededOn;
      if (!acc.line.description && p.description) acc.line.description = p.description.trim();
      acc.machines.set(s.machine.id, s.machine);
      lines.set(key, acc);
    }
  return [...lines.values()]
    .map((a) => ({
      ...a.line,
      machines: [...a.machines.values()].sort((x, y) => x.fleetNumber.localeCompare(y.fleetNumber)),
    }))
    .sort(
      (a, b) =>
        a.firstNeededOn.localeCompare(b.firstNeededOn) ||
        (a.partNumber || a.description).localeCompare(b.partNumber || b.description),
    );
}

function summarise(services: ForecastService[], units: UnitSystem): PartsSummary {
  const fluids = services.flatMap((s) =>
    s.fluids.map((fluid) => ({ fluid, machineId: s.machine.id, neededOn: s.neededOn })),
  );
  return {
    parts: sumConsumables(services),
    fluids: sumFluids(fluids, units),
    wearParts: listWearParts(services),
  };
}

/**
 * Sums the consumable parts (by part number, case and spaces aside) and fluids (by kind, in the
 * stock units of `units`) of the given services and lists their wear parts: in total, and per
 * customer in the order of the customers' names.
 */
export function sumPartsForecast(
  services: ForecastService[],
  units: UnitSystem,
): PartsSummary & { customers: ({ customer: { id: string; name: string } } & PartsSummary)[] } {
  const byCustomer = new Map<string, ForecastService[]>();
  for (const s of services)
    byCustomer.set(s.customer.id, [...(byCustomer.get(s.customer.id) ?? []), s]);
  const customers = [...byCustomer.values()]
    .map((list) => ({ customer: list[0].customer, ...summarise(list, units) }))
    .sort((a, b) => a.customer.name.localeCompare(b.customer.name));
  return { ...summarise(services, units), customers };
}
