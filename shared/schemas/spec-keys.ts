// The names a machine's spec sheet is keyed by (issue 11): its fluid compartments, its filter
// roles and the units each figure may be given in. Kept apart from spec-sheet.ts, which imports
// schedule.ts's bounds, so that schedule.ts can name a capacity or a filter role on a task's line
// without an import cycle. Display words live beside the keys.

/** The compartments whose capacity and fluid the sheet gives. */
export const CAPACITY_KEYS = [
  'engineOil',
  'hydraulicTransmission',
  'frontAxle',
  'rearAxle',
  'coolant',
  'fuel',
  'def',
] as const;
export type CapacityKey = (typeof CAPACITY_KEYS)[number];

export const CAPACITY_LABELS: Record<CapacityKey, string> = {
  engineOil: 'Engine oil',
  hydraulicTransmission: 'Hydraulic/transmission',
  frontAxle: 'Front axle',
  rearAxle: 'Rear axle/final drives',
  coolant: 'Coolant',
  fuel: 'Fuel tank',
  def: 'DEF tank',
};

/** What a task's fluid line calls the compartment's fluid (before the sheet's specification). */
export const CAPACITY_FLUID_NAMES: Record<CapacityKey, string> = {
  engineOil: 'Engine oil',
  hydraulicTransmission: 'Hydraulic/transmission oil',
  frontAxle: 'Front axle oil',
  rearAxle: 'Rear axle/final drive oil',
  coolant: 'Coolant',
  fuel: 'Fuel',
  def: 'DEF',
};

/**
 * Capacities in litres or US gallons: the volume units of task lines ('gal' is the US gallon of
 * FLUID_UNITS) that the parts forecast converts between.
 */
export const CAPACITY_UNITS = ['L', 'gal'] as const;
export type CapacityUnit = (typeof CAPACITY_UNITS)[number];
export const CAPACITY_UNIT_LABELS: Record<CapacityUnit, string> = { L: 'L', gal: 'US gal' };

/** The filters (and like parts) the sheet gives a part number for. */
export const FILTER_ROLES = [
  'engineOil',
  'fuelPrimary',
  'fuelSecondary',
  'hydraulic',
  'transmission',
  'airOuter',
  'airInner',
  'cab',
  'def',
] as const;
export type FilterRole = (typeof FILTER_ROLES)[number];

export const FILTER_ROLE_LABELS: Record<FilterRole, string> = {
  engineOil: 'Engine oil filter',
  fuelPrimary: 'Fuel primary filter / water separator',
  fuelSecondary: 'Fuel secondary filter',
  hydraulic: 'Hydraulic filter',
  transmission: 'Transmission filter',
  airOuter: 'Air filter, outer element',
  airInner: 'Air filter, inner (safety) element',
  cab: 'Cab air filter',
  def: 'DEF filter',
};

export const TYRE_POSITIONS = ['front', 'rear'] as const;
export type TyrePosition = (typeof TYRE_POSITIONS)[number];
export const TYRE_POSITION_LABELS: Record<TyrePosition, string> = { front: 'Front', rear: 'Rear' };

export const TYRE_PRESSURE_UNITS = ['kPa', 'psi', 'bar'] as const;
export type TyrePressureUnit = (typeof TYRE_PRESSURE_UNITS)[number];

export const TEST_PRESSURE_UNITS = ['kPa', 'bar', 'psi', 'MPa'] as const;
export type TestPressureUnit = (typeof TEST_PRESSURE_UNITS)[number];

export const TORQUE_UNITS = ['Nm', 'lbf_ft'] as const;
export type TorqueUnit = (typeof TORQUE_UNITS)[number];
export const TORQUE_UNIT_LABELS: Record<TorqueUnit, string> = { Nm: 'N·m', lbf_ft: 'lbf·ft' };

export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
export const TEMPERATURE_UNIT_LABELS: Record<TemperatureUnit, string> = { C: '°C', F: '°F' };
