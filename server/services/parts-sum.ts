// The parts forecast's arithmetic, kept pure (no database) so it is tested against a hand-worked
// example: parts summed by part number and fluids by kind and unit, per customer and in total.
// Wear parts are left out: a service inspects them and replaces one only when it is worn.

/** One due service as the forecast needs it: who, which machine, when, and its lists. */
export interface ForecastService {
  customer: { id: string; name: string };
  machineId: string;
  /** ISO local date the parts are first needed (today for an overdue service) */
  neededOn: string;
  /** a wear part (belt, tine, knife) is replaced only when worn: never summed as needed */
  parts: { partNumber: string; description: string; quantity: number; wearPart?: boolean }[];
  fluids: { kind: string; volume: number; unit: string }[];
}

export interface PartLine {
  partNumber: string;
  description: string;
  /** summed over the services */
  quantity: number;
  /** distinct machines that need it */
  machines: number;
  /** services (task visits) that need it */
  services: number;
  firstNeededOn: string;
}

export interface FluidLine {
  kind: string;
  unit: string;
  /** summed volume, in `unit` (units are never converted: L and gal stay two lines) */
  volume: number;
  machines: number;
  services: number;
  firstNeededOn: string;
}

export interface PartsSummary {
  parts: PartLine[];
  fluids: FluidLine[];
}

const round = (n: number, places: number) => Math.round(n * 10 ** places) / 10 ** places;
const partKey = (partNumber: string) => partNumber.trim().toUpperCase();
const fluidKey = (kind: string, unit: string) => `${kind.trim().toLowerCase()}|${unit}`;

interface Acc<T> {
  line: T;
  machines: Set<string>;
}

function summarise(services: ForecastService[]): PartsSummary {
  const parts = new Map<string, Acc<PartLine>>();
  const fluids = new Map<string, Acc<FluidLine>>();
  for (const s of services) {
    for (const p of s.parts) {
      if (p.wearPart) continue;
      const key = partKey(p.partNumber);
      const acc = parts.get(key) ?? {
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
      acc.line.quantity = round(acc.line.quantity + p.quantity, 3);
      acc.line.services += 1;
      if (s.neededOn < acc.line.firstNeededOn) acc.line.firstNeededOn = s.neededOn;
      if (!acc.line.description && p.description) acc.line.description = p.description;
      acc.machines.add(s.machineId);
      parts.set(key, acc);
    }
    for (const f of s.fluids) {
      const key = fluidKey(f.kind, f.unit);
      const acc = fluids.get(key) ?? {
        line: {
          kind: f.kind.trim(),
          unit: f.unit,
          volume: 0,
          machines: 0,
          services: 0,
          firstNeededOn: s.neededOn,
        },
        machines: new Set<string>(),
      };
      acc.line.volume = round(acc.line.volume + f.volume, 2);
      acc.line.services += 1;
      if (s.neededOn < acc.line.firstNeededOn) acc.line.firstNeededOn = s.neededOn;
      acc.machines.add(s.machineId);
      fluids.set(key, acc);
    }
  }
  const done = <T extends { machines: number }>(m: Map<string, Acc<T>>) =>
    [...m.values()].map((a) => ({ ...a.line, machines: a.machines.size }));
  return {
    parts: done(parts).sort(
      (a, b) =>
        a.firstNeededOn.localeCompare(b.firstNeededOn) ||
        partKey(a.partNumber).localeCompare(partKey(b.partNumber)),
    ),
    fluids: done(fluids).sort(
      (a, b) => a.firstNeededOn.localeCompare(b.firstNeededOn) || a.kind.localeCompare(b.kind),
    ),
  };
}

/**
 * Sums the parts (by part number, case and spaces aside) and fluids (by kind and unit) of the
 * given services: in total, and per customer in the order customers first appear by name.
 */
export function sumPartsForecast(services: ForecastService[]): PartsSummary & {
  customers: ({ customer: { id: string; name: string } } & PartsSummary)[];
} {
  const byCustomer = new Map<string, ForecastService[]>();
  for (const s of services)
    byCustomer.set(s.customer.id, [...(byCustomer.get(s.customer.id) ?? []), s]);
  const customers = [...byCustomer.values()]
    .map((list) => ({ customer: list[0].customer, ...summarise(list) }))
    .sort((a, b) => a.customer.name.localeCompare(b.customer.name));
  return { ...summarise(services), customers };
}
