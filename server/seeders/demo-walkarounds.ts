// The demo's walkaround checklists (the built-in list of every category, editable per farm),
// recent walkarounds by the operators, and their defects: a tyre cut to watch on T-01, a flasher
// out on T-02 (in repair; the machine restricted to field work), a cracked PTO master shield that
// has T-03 tagged out with a repair booked, and an older hose failure on T-02 closed by a repair
// visit.
import type { CreationAttributes, Transaction } from 'sequelize';
import { ChecklistTemplate, Defect, Machine, ServiceRecord, Walkaround } from '../models';
import type { WalkaroundItem } from '../models/walkaround';
import { MACHINE_CATEGORIES } from '../../shared/constants';
import type { WalkaroundResult } from '../../shared/schemas/walkarounds';
import type { DefectSeverity } from '../../shared/schemas/defects';
import { addDaysIso, todayIso } from '../../shared/domain';
import { builtInChecklist, defaultChecklist } from '../services/checklist-defaults';
import { localDate, type DemoMachineWorld } from './demo-service-visits';
import { writeRestrictions } from './demo-restrictions';

const DAY = 86_400_000;

/** One farm's checklist templates: the built-in list of each category, as a starting point. */
export function demoChecklists(
  organizationKey: string,
  organizationId: string,
  id: (name: string) => string,
) {
  return MACHINE_CATEGORIES.map((category) => {
    const d = builtInChecklist(category);
    return {
      id: id(`checklist/${organizationKey}/${category}`),
      organizationId,
      category,
      name: d.name,
      description: d.description,
      items: d.items,
    };
  });
}

interface Finding {
  itemId: string;
  result: Exclude<WalkaroundResult, 'ok'>;
  note: string;
}

/** Scripted findings: [fleet number, days ago, finding]. */
const FINDINGS: [string, number, Finding][] = [
  [
    'T-02',
    24,
    { itemId: 'hoses', result: 'fail', note: 'Hose to the loader valve weeping at the crimp' },
  ],
  [
    'T-01',
    0,
    {
      itemId: 'tyre-damage',
      result: 'attention',
      note: 'Cut in the right rear sidewall, about 3 cm; no cords showing',
    },
  ],
  ['T-02', 0, { itemId: 'lights', result: 'fail', note: 'Left rear flasher out' }],
  [
    'T-03',
    1,
    {
      itemId: 'pto-master-shield',
      result: 'fail',
      note: 'Master shield cracked and hanging loose on the left side',
    },
  ],
];

type WalkaroundRow = CreationAttributes<Walkaround>;
type DefectRow = CreationAttributes<Defect>;

/** Writes checklists, walkarounds, defects, the hose repair visit and the T-03 repair plan. */
export async function writeWalkarounds(
  farms: { key: string; id: string }[],
  machines: DemoMachineWorld[],
  today: Date,
  id: (name: string) => string,
  transaction: Transaction,
) {
  await ChecklistTemplate.bulkCreate(
    farms.flatMap((f) => demoChecklists(f.key, f.id, id)),
    { transaction, returning: false },
  );
  const walkarounds: WalkaroundRow[] = [];
  const defects: DefectRow[] = [];
  const records: CreationAttributes<ServiceRecord>[] = [];
  const taggedOut: string[] = [];

  for (const m of machines) {
    const operator = m.operatorIds[0] ?? (m.organizationKey === 'osier' ? m.shopPersonId : null);
    if (!operator) continue;
    const checklist = defaultChecklist(m.category, m.machineClass);
    const findings = FINDINGS.filter(([fleet]) => fleet === m.fleetNumber);
    // the operator's walkarounds at the machine's readings of the last week, plus scripted days
    const recent = m.readings.filter((r) => r.takenAt.getTime() >= today.getTime() - 7 * DAY);
    const days = new Set(recent.map((r) => localDate(r.takenAt, m.timeZone)));
    const todayLocal = todayIso(m.timeZone, today);
    for (const [, ago] of findings) days.add(addDaysIso(todayLocal, -ago));
    for (const day of [...days].sort()) {
      // the last reading on or before that day is the meter the operator saw
      const reading = [...m.readings]
        .reverse()
        .find((r) => localDate(r.takenAt, m.timeZone) <= day);
      if (!reading) continue;
      const found = findings
        .filter(([, ago]) => addDaysIso(todayLocal, -ago) === day)
        .map(([, , f]) => f);
      const items: WalkaroundItem[] = checklist.items.map((item) => {
        const f = found.find((x) => x.itemId === item.id);
        return {
          itemId: item.id,
          label: item.label,
          critical: item.critical,
          result: f?.result ?? 'ok',
          note: f?.note ?? '',
          photoId: null,
        };
      });
      const walkaroundId = id(`walkaround/${m.organizationKey}/${m.fleetNumber}/${day}`);
      const performedAt = new Date(reading.takenAt.getTime() - 10 * 60_000);
      const critical = items.some((i) => i.critical && i.result === 'fail');
      walkarounds.push({
        id: walkaroundId,
        organizationId: m.organizationId,
        machineId: m.id,
        operatorId: operator,
        clientId: id(`walkaround-client/${walkaroundId}`),
        purpose: 'use',
        performedAt,
        meterValue: reading.value,
        readingId: null,
        templateId: id(`checklist/${m.organizationKey}/${m.category}`),
        templateName: checklist.name,
        items,
        result: items.some((i) => i.result === 'fail') ? 'fail' : found.length ? 'attention' : 'ok',
        taggedOut: critical,
        notes: '',
        createdAt: performedAt,
      });
      for (const item of items.filter((i) => i.result !== 'ok')) {
        const severity: DefectSeverity =
          item.result === 'fail' ? (item.critical ? 'critical' : 'major') : 'minor';
        const defectId = id(`defect/${m.organizationKey}/${m.fleetNumber}/${day}/${item.itemId}`);
        const history = m.fleetNumber === 'T-02' && item.itemId === 'hoses';
        const repair = history ? repairVisit(m, performedAt, defectId, id) : null;
        if (repair) records.push(repair);
        defects.push({
          id: defectId,
          organizationId: m.organizationId,
          machineId: m.id,
          title: `${item.label}: ${item.result === 'fail' ? 'fail' : 'needs attention'}`,
          description: item.note,
          severity,
          status: repair ? 'fixed' : item.itemId === 'lights' ? 'in_repair' : 'open',
          walkaroundId,
          itemId: item.itemId,
          photoId: null,
          reportCount: 1,
          lastReportedAt: performedAt,
          reportedBy: operator,
          assignedTo:
            item.result === 'fail' || item.itemId === 'tyre-damage' ? m.shopPersonId : null,
          fixedAt: repair?.completedAt ?? null,
          fixedBy: repair ? m.shopPersonId : null,
          fixedByRecordId: repair?.id ?? null,
          fixNote: '',
          createdAt: performedAt,
          updatedAt: repair?.completedAt ?? performedAt,
        });
        if (severity === 'critical' && !repair) {
          taggedOut.push(m.id);
          records.push(repairPlan(m, todayLocal, defectId, id));
        }
      }
    }
  }
  await Walkaround.bulkCreate(walkarounds, { transaction, returning: false });
  // records first: a fixed defect points at the visit that fixed it
  await ServiceRecord.bulkCreate(records, { transaction, returning: false });
  await Defect.bulkCreate(defects, { transaction, returning: false });
  if (taggedOut.length)
    await Machine.update({ status: 'tagged_out' }, { where: { id: taggedOut }, transaction });
  await writeRestrictions(machines, defects, transaction);
  return { walkarounds: walkarounds.length, defects: defects.length };
}

/** The visit after the hose failure: a hose replaced, the defect closed by it. */
function repairVisit(
  m: DemoMachineWorld,
  foundAt: Date,
  defectId: string,
  id: (name: string) => string,
): CreationAttributes<ServiceRecord> | null {
  const next = m.readings.find((r) => r.takenAt.getTime() > foundAt.getTime() + 3600_000);
  if (!next) return null;
  const at = new Date(next.takenAt.getTime() - 30 * 60_000);
  return {
    id: id(`service/${m.organizationKey}/${m.fleetNumber}/hose-repair`),
    organizationId: m.organizationId,
    machineId: m.id,
    status: 'completed',
    plannedFor: null,
    performedOn: localDate(at, m.timeZone),
    meterValue: next.value,
    meterLifetime: next.lifetimeValue,
    readingId: null,
    tasks: [],
    technicianIds: m.shopPersonId ? [m.shopPersonId] : [],
    labourHours: 1.5,
    parts: [
      {
        partNumber: 'HS-HH-1188',
        description: 'Hydraulic hose assembly, loader valve',
        quantity: 1,
        unitCostMinor: 8640,
      },
    ],
    fluids: [],
    otherCosts: [],
    notes:
      'Replaced the weeping hose at the loader valve with everything lowered and pressure relieved; checked the fittings with cardboard: no leaks.',
    reassemblySettings: [],
    unrestoredReason: '',
    defectIds: [defectId],
    createdBy: m.shopPersonId,
    completedBy: m.shopPersonId,
    completedAt: at,
    createdAt: at,
    updatedAt: at,
  };
}

/** A repair booked for tomorrow, covering the defect that tagged the machine out. */
function repairPlan(
  m: DemoMachineWorld,
  todayLocal: string,
  defectId: string,
  id: (name: string) => string,
): CreationAttributes<ServiceRecord> {
  return {
    id: id(`plan/${m.organizationKey}/${m.fleetNumber}/repair`),
    organizationId: m.organizationId,
    machineId: m.id,
    status: 'planned',
    plannedFor: addDaysIso(todayLocal, 1),
    performedOn: null,
    meterValue: null,
    meterLifetime: null,
    readingId: null,
    tasks: [],
    technicianIds: m.shopPersonId ? [m.shopPersonId] : [],
    labourHours: 1,
    parts: [
      {
        partNumber: 'HS-PS-1140',
        description: 'PTO master shield',
        quantity: 1,
        unitCostMinor: null,
      },
    ],
    fluids: [],
    otherCosts: [],
    notes: 'Fit the new master shield; clear the tag-out once checked.',
    reassemblySettings: [],
    unrestoredReason: '',
    defectIds: [defectId],
    createdBy: m.shopPersonId,
    completedBy: null,
    completedAt: null,
  };
}
