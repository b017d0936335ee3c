// The downloadable example fleet file: invented machines written the way this farm's
// spreadsheet would write them (its date order; semicolons and a decimal comma on metric farms),
// with a machine class of the service library on each machine it fits, a schedule column when the
// farm has schedule templates, and the last service of one task of the first machine.
import { stringify } from 'csv-stringify/sync';
import { ScheduleTemplate } from '../models';
import { addDaysIso, todayIso } from '../../shared/domain';
import {
  MACHINE_CLASS_LABELS,
  serviceLibraryClass,
  type MachineClass,
} from '../../shared/domain/service-library';
import type { OrgAccess } from '../policies/access';
import { localDateOrder } from '../infra/csv-sheet';

const MACHINES = [
  [
    'T-11',
    'Brindle 4WD tractor',
    'tractor',
    'Brindle',
    'BX 420',
    'BR4-118730',
    '2015',
    'h',
    4210.5,
  ],
  ['L-02', 'Corvid loader tractor', 'loader', 'Corvid', 'CL 95', 'CV-22051', '2019', 'h', 1875],
  ['TR-04', 'Grain truck', 'truck', 'Harl', 'H 300', 'HL-300-7781', '2011', 'km', 212480],
  ['B-03', 'Round baler', 'baler', 'Tamsin', 'RB 160', 'TS-RB-4410', '2018', 'bales', 18400],
] as const;

/** The service library's class of each example machine (the baler's in bales: its variant). */
const CLASSES: (MachineClass | null)[] = [
  'articulated_tractor',
  'utility_loader_tractor',
  'grain_truck',
  'round_baler',
];

/** The example file's text (with a byte-order mark, so spreadsheet programs read it as UTF-8). */
export async function fleetExampleCsv(access: OrgAccess): Promise<string> {
  const metric = access.organization.units === 'metric';
  const order = localDateOrder(access);
  const local = (iso: string) => {
    const [y, m, d] = iso.split('-');
    return order === 'mdy' ? `${m}/${d}/${y}` : `${d}/${m}/${y}`;
  };
  const number = (n: number) => (metric ? String(n).replace('.', ',') : String(n));
  const today = todayIso(access.organization.timeZone);
  const templates = await ScheduleTemplate.findAll({
    where: { organizationId: access.organization.id },
    order: [['name', 'ASC']],
  });
  const template = templates.find((t) => t.category === 'tractor') ?? templates[0] ?? null;
  // the first machine's last service: of a task of its template, or else of its class
  const tasks = template?.tasks ?? serviceLibraryClass(CLASSES[0]!).tasks;
  const task = tasks.find((t) => t.intervalMeter !== null) ?? tasks[0] ?? null;

  const header = [
    'fleet number',
    'name',
    'category',
    'make',
    'model',
    'serial',
    'year',
    'meter unit',
    'meter reading',
    'reading date',
    'machine class',
    ...(template ? ['schedule'] : []),
    ...(task ? [`${task.name} last done`, `${task.name} last meter`] : []),
  ];
  const rows = MACHINES.map(
    ([fleet, name, category, make, model, serial, year, unit, meter], i) => {
      const row: string[] = [fleet, name, category, make, model, serial, year, unit, number(meter)];
      row.push(local(addDaysIso(today, -7)));
      const machineClass = CLASSES[i];
      row.push(machineClass ? MACHINE_CLASS_LABELS[machineClass] : '');
      // the first machine gets the schedule and the last service of one of its tasks
      const first = i === 0;
      if (template) row.push(first ? template.name : '');
      if (task) row.push(first ? local(addDaysIso(today, -90)) : '', first ? number(3990) : '');
      return row;
    },
  );
  return `\uFEFF${stringify([header, ...rows], { delimiter: metric ? ';' : ',', record_delimiter: 'windows' })}`;
}
