// Names shared by client and server; the database CHECK constraints use the same values.
export const FARM_ROLES = ['manager', 'technician', 'operator'] as const;
export const DEALER_ROLES = ['advisor'] as const;
export const ROLES = [...FARM_ROLES, ...DEALER_ROLES] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  manager: 'Manager',
  technician: 'Technician',
  operator: 'Operator',
  advisor: 'Service advisor',
};

export const ORGANIZATION_KINDS = ['farm', 'dealer'] as const;
export type OrganizationKind = (typeof ORGANIZATION_KINDS)[number];
export const UNIT_SYSTEMS = ['metric', 'imperial'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export const MACHINE_CATEGORIES = [
  'tractor',
  'combine',
  'sprayer',
  'baler',
  'loader',
  'mower',
  'truck',
  'implement',
  'other',
] as const;
export type MachineCategory = (typeof MACHINE_CATEGORIES)[number];
export const CATEGORY_LABELS: Record<MachineCategory, string> = {
  tractor: 'Tractor',
  combine: 'Combine',
  sprayer: 'Sprayer',
  baler: 'Baler',
  loader: 'Loader',
  mower: 'Mower',
  truck: 'Truck',
  implement: 'Implement',
  other: 'Other',
};

// 'mi' (miles) came with issue 11, for a road machine on a US farm (migration 0022).
export const METER_UNITS = ['h', 'km', 'mi', 'bales', 'ha', 'acres'] as const;
export type MeterUnit = (typeof METER_UNITS)[number];
export const METER_UNIT_LABELS: Record<MeterUnit, string> = {
  h: 'hours',
  km: 'km',
  mi: 'miles',
  bales: 'bales',
  ha: 'ha',
  acres: 'acres',
};

// Several meters per machine (issue 13, migration 0026): each meter has a kind, and its unit
// follows from the kind. A machine's first meter (its primary) comes from its meter unit.
export const METER_KINDS = [
  'engine_hours',
  'separator_hours',
  'pto_hours',
  'bales',
  'km',
  'miles',
  'hectares',
  'acres',
] as const;
export type MeterKind = (typeof METER_KINDS)[number];
export const METER_KIND_UNITS: Record<MeterKind, MeterUnit> = {
  engine_hours: 'h',
  separator_hours: 'h',
  pto_hours: 'h',
  bales: 'bales',
  km: 'km',
  miles: 'mi',
  hectares: 'ha',
  acres: 'acres',
};
export const METER_KIND_LABELS: Record<MeterKind, string> = {
  engine_hours: 'Engine hours',
  separator_hours: 'Separator hours',
  pto_hours: 'PTO hours',
  bales: 'Bale counter',
  km: 'Odometer (km)',
  miles: 'Odometer (miles)',
  hectares: 'Area (ha)',
  acres: 'Area (acres)',
};
/** The kind of a machine's primary meter when only its meter unit is known. */
export const PRIMARY_KIND_OF_UNIT: Record<MeterUnit, MeterKind> = {
  h: 'engine_hours',
  km: 'km',
  mi: 'miles',
  bales: 'bales',
  ha: 'hectares',
  acres: 'acres',
};
/** A meter replacement, or a counter zeroed on the same meter (recorded alike, issue 13). */
export const METER_CHANGE_KINDS = ['replacement', 'reset'] as const;
export type MeterChangeKind = (typeof METER_CHANGE_KINDS)[number];

export const MACHINE_STATUSES = ['in_service', 'tagged_out', 'sold'] as const;
export type MachineStatus = (typeof MACHINE_STATUSES)[number];
export const MACHINE_STATUS_LABELS: Record<MachineStatus, string> = {
  in_service: 'In service',
  tagged_out: 'Tagged out',
  sold: 'Sold',
};

// 'hitch': an implement's hours from the tractor it was hitched to (migration 0028), written by
// the server from the hitch log, never typed
export const READING_SOURCES = [
  'manual',
  'walkaround',
  'import',
  'service',
  'telematics',
  'hitch',
] as const;
export type ReadingSource = (typeof READING_SOURCES)[number];

// history_unknown: a task on a machine that came with hours, whose last service nobody has
// given yet; it is not guessed, so it is neither OK nor due.
export const DUE_STATUSES = [
  'overdue',
  'due_soon',
  'history_unknown',
  'ok',
  'no_forecast',
] as const;
export const DUE_STATUS_LABELS = {
  overdue: 'Overdue',
  due_soon: 'Due soon',
  history_unknown: 'History unknown',
  ok: 'OK',
  no_forecast: 'No forecast',
} as const;

export const DUE_HORIZONS = [7, 30, 90] as const;
/** A machine in season with no reading for this many days is flagged as stale. */
export const STALE_READING_DAYS = 14;

/** The hazards a task or checklist item can carry (shared/schemas/schedule.ts HAZARDS), in words. */
export const HAZARD_LABELS = {
  pto: 'PTO shaft',
  hydraulic_pressure: 'Stored hydraulic pressure',
  raised_load: 'Raised implement or load',
  stored_energy: 'Springs and other stored energy',
  hot_fluid: 'Hot fluids',
  battery: 'Battery',
  chemicals: 'Chemicals',
  tyres_rims: 'Tyres and rims',
  power_lines: 'Overhead power lines',
  hitching_crush: 'Hitching crush points',
} as const;

/** A hazard's words, also for a value this client does not know yet. */
export const hazardLabel = (hazard: string): string =>
  (HAZARD_LABELS as Record<string, string>)[hazard] ?? hazard.replace(/_/g, ' ');

/** The line every caution ends with: the product defers to those who know the machine. */
export const SAFETY_DEFERRAL =
  "Follow the operator's manual, local regulations and qualified service practice.";
