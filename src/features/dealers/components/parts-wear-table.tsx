import { TableScroll } from '../../../components/ui/table-scroll';
import type { WearLine } from '../api/types';
import { dateText } from './dealer-format';

// Wear parts (belts, tines, knives) are inspected at a service and replaced only when worn: the
// forecast names the machines they sit on and never a quantity to stock, so the counter can ask
// before the visit rather than order a full set for every machine.
const th = 'px-1.5 py-2 text-left text-sm font-bold text-field-700 sm:px-2.5';
const td = 'px-1.5 py-2.5 align-top break-words sm:px-2.5';

/** The wear parts the due services inspect, with their machines and the first inspection date. */
export function PartsWearTable({ lines, label }: { lines: WearLine[]; label: string }) {
  if (lines.length === 0) return null;
  const name = `Wear parts to inspect: ${label}`;
  return (
    <div className="flex flex-col gap-2">
      <h3 className="font-bold text-field-900">To inspect — replaced when worn</h3>
      <p className="text-sm text-field-700">
        Not counted as needed: each is replaced only if the inspection finds it worn. Ask the farm
        or check at the visit before ordering.
      </p>
      <TableScroll label={name}>
        <table className="w-full border-collapse">
          <caption className="sr-only">{name}</caption>
          <thead className="border-b border-field-200 bg-oat-100">
            <tr>
              <th scope="col" className={th}>
                Wear part
              </th>
              <th scope="col" className={th}>
                On machines
              </th>
              <th scope="col" className={th}>
                First inspected
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-field-100">
            {lines.map((w) => (
              <tr key={`${w.partNumber}|${w.description}`}>
                <td className={td}>
                  <span className="font-bold">{w.description || w.partNumber}</span>
                  {w.partNumber && w.description ? (
                    <span className="block text-sm text-field-600">{w.partNumber}</span>
                  ) : null}
                </td>
                <td className={td}>
                  {w.machines.map((m) => (
                    <span key={m.id} className="block">
                      {m.fleetNumber} <span className="text-sm text-field-600">{m.name}</span>
                    </span>
                  ))}
                </td>
                <td className={`${td} whitespace-nowrap`}>{dateText(w.firstNeededOn)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
    </div>
  );
}
