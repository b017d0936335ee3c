// The figures of the demo's spec sheets, by farm and fleet number (written by
// demo-spec-sheets.ts): invented but plausible, for fictional makes, in each farm's own units.
import type { SpecSheetFormInput } from '../../shared/schemas/spec-sheet';

type Sheet = SpecSheetFormInput;
type Unit = 'L' | 'gal';

const cap = (quantity: number, unit: Unit, spec = '') => ({ quantity, unit, spec });

/** A test pressure with its conditions: range, unit, engine rpm, oil temperature (and unit). */
const test = (
  name: string,
  [min, max]: [number, number],
  unit: 'kPa' | 'bar' | 'psi',
  engineRpm: number,
  [oil, oilUnit]: [number, 'C' | 'F'],
  conditions = '',
) => ({
  name,
  min,
  max,
  unit,
  engineRpm,
  oilTemperature: { value: oil, unit: oilUnit },
  conditions,
});

const ENGINE_OIL = 'SAE 15W-40, API CK-4';
const UTTO = 'Universal tractor transmission oil';
const AXLE = 'SAE 85W-140, API GL-5';
const ELC = 'Extended-life coolant, 50/50';
const DIESEL = 'Ultra-low-sulfur diesel';
const DEF = 'DEF to ISO 22241';

/** Filters numbered as a make's parts counter would: prefix, model, role. */
const filters = (prefix: string, roles: string[]) =>
  Object.fromEntries(roles.map((r, i) => [r, `${prefix}-${String(i + 1).padStart(2, '0')}`]));
const ENGINE_FILTERS = ['engineOil', 'fuelPrimary', 'fuelSecondary', 'airOuter', 'airInner'];

const LARKSPUR: Record<string, Sheet> = {
  'T-01': {
    capacities: {
      engineOil: cap(10.5, 'gal', ENGINE_OIL),
      hydraulicTransmission: cap(48, 'gal', UTTO),
      frontAxle: cap(6.5, 'gal', AXLE),
      rearAxle: cap(7, 'gal', AXLE),
      coolant: cap(15, 'gal', ELC),
      fuel: cap(330, 'gal', DIESEL),
      def: cap(32, 'gal', DEF),
    },
    filters: filters('BR-B480', [...ENGINE_FILTERS, 'hydraulic', 'transmission', 'cab', 'def']),
    tyrePressures: {
      front: { value: 20, unit: 'psi', note: 'IF 800/70R38 duals, field work' },
      rear: { value: 18, unit: 'psi', note: 'IF 800/70R38 duals, field work' },
    },
    torques: [{ name: 'Wheel nuts', value: 450, unit: 'lbf_ft', note: 'cross pattern' }],
    testPressures: [
      test('Hydraulic standby pressure', [400, 450], 'psi', 2100, [120, 'F'], 'no function held'),
      test(
        'Hydraulic relief pressure',
        [3050, 3150],
        'psi',
        2100,
        [120, 'F'],
        'remote held over relief',
      ),
      test('Transmission lube pressure', [25, 45], 'psi', 1500, [150, 'F']),
    ],
    notes: "Copied from the operator's manual, maintenance section; check it at each new edition.",
  },
  'T-02': {
    capacities: {
      engineOil: cap(5.5, 'gal', ENGINE_OIL),
      hydraulicTransmission: cap(30, 'gal', UTTO),
      frontAxle: cap(2.9, 'gal', AXLE),
      coolant: cap(7.6, 'gal', ELC),
      fuel: cap(110, 'gal', DIESEL),
      def: cap(12, 'gal', DEF),
    },
    filters: filters('TM-RC210', [...ENGINE_FILTERS, 'hydraulic', 'cab', 'def']),
    tyrePressures: {
      front: { value: 23, unit: 'psi', note: '480/70R30' },
      rear: { value: 18, unit: 'psi', note: '520/85R42' },
    },
    torques: [
      { name: 'Front wheel nuts', value: 300, unit: 'lbf_ft', note: '' },
      { name: 'Rear wheel nuts', value: 400, unit: 'lbf_ft', note: '' },
    ],
    testPressures: [
      test('PTO clutch pressure', [270, 300], 'psi', 2100, [120, 'F'], 'PTO engaged'),
      test('Hydraulic relief pressure', [2900, 3000], 'psi', 2100, [120, 'F']),
    ],
  },
  'T-03': {
    capacities: {
      engineOil: cap(2.4, 'gal', 'SAE 10W-30, API CK-4'),
      hydraulicTransmission: cap(12, 'gal', UTTO),
      frontAxle: cap(1.6, 'gal', AXLE),
      coolant: cap(3.2, 'gal', ELC),
      fuel: cap(30, 'gal', DIESEL),
    },
    filters: filters('CV-U75', [...ENGINE_FILTERS, 'hydraulic', 'cab']),
    tyrePressures: { front: { value: 26, unit: 'psi', note: 'loader work' } },
    torques: [{ name: 'Wheel nuts', value: 220, unit: 'lbf_ft', note: '' }],
    testPressures: [test('Loader relief pressure', [2750, 2900], 'psi', 2300, [120, 'F'])],
  },
  'C-01': {
    capacities: {
      engineOil: cap(9, 'gal', ENGINE_OIL),
      hydraulicTransmission: cap(32, 'gal', 'ISO VG 46 hydraulic oil'),
      rearAxle: cap(3.4, 'gal', AXLE),
      coolant: cap(14, 'gal', ELC),
      fuel: cap(300, 'gal', DIESEL),
      def: cap(35, 'gal', DEF),
    },
    extraCapacities: [
      { name: 'Feeder house gearbox', quantity: 1.1, unit: 'gal', spec: 'SAE 80W-90' },
    ],
    filters: filters('HL-TW8', [...ENGINE_FILTERS, 'hydraulic', 'cab', 'def']),
    tyrePressures: { front: { value: 32, unit: 'psi', note: 'IF 900/60R32, with header' } },
    torques: [{ name: 'Drive wheel nuts', value: 480, unit: 'lbf_ft', note: '' }],
    testPressures: [test('Header lift relief pressure', [2900, 3100], 'psi', 2200, [120, 'F'])],
  },
  'S-01': {
    capacities: {
      engineOil: cap(6, 'gal', ENGINE_OIL),
      hydraulicTransmission: cap(40, 'gal', 'ISO VG 46 hydraulic oil'),
      coolant: cap(9, 'gal', ELC),
      fuel: cap(120, 'gal', DIESEL),
      def: cap(10, 'gal', DEF),
    },
    filters: filters('TM-SP1200', [...ENGINE_FILTERS, 'hydraulic', 'cab', 'def']),
    extraFilters: [{ name: 'Cab dust pre-filter', partNumber: 'TM-SP1200-PF' }],
    tyrePressures: {
      front: { value: 44, unit: 'psi', note: '380/90R46, full tank' },
      rear: { value: 44, unit: 'psi', note: '380/90R46, full tank' },
    },
    torques: [{ name: 'Wheel nuts', value: 400, unit: 'lbf_ft', note: '' }],
    testPressures: [test('Boom fold circuit pressure', [2400, 2600], 'psi', 2000, [120, 'F'])],
  },
  'TR-01': {
    capacities: {
      engineOil: cap(10, 'gal', ENGINE_OIL),
      hydraulicTransmission: cap(4, 'gal', 'Synthetic transmission fluid'),
      rearAxle: cap(5, 'gal', AXLE),
      coolant: cap(12, 'gal', ELC),
      fuel: cap(100, 'gal', DIESEL),
    },
    filters: filters('HL-GT', ENGINE_FILTERS),
    tyrePressures: {
      front: { value: 110, unit: 'psi', note: '11R22.5 steer' },
      rear: { value: 100, unit: 'psi', note: '11R22.5 drive' },
    },
    torques: [{ name: 'Wheel nuts', value: 475, unit: 'lbf_ft', note: 'lubricated studs' }],
  },
  'B-01': {
    extraCapacities: [{ name: 'Main gearbox', quantity: 1.6, unit: 'gal', spec: 'SAE 80W-90' }],
    tyrePressures: { front: { value: 30, unit: 'psi', note: '500/55-20' } },
    torques: [{ name: 'Wheel nuts', value: 220, unit: 'lbf_ft', note: '' }],
  },
  'M-01': {
    extraCapacities: [
      { name: 'Cutter bar', quantity: 1.1, unit: 'gal', spec: 'SAE 80W-90' },
      { name: 'Main gearbox', quantity: 0.7, unit: 'gal', spec: 'SAE 80W-90' },
    ],
    tyrePressures: { front: { value: 36, unit: 'psi', note: '' } },
  },
};

const OSIER: Record<string, Sheet> = {
  'T-11': {
    capacities: {
      engineOil: cap(13, 'L', ENGINE_OIL),
      hydraulicTransmission: cap(58, 'L', UTTO),
      frontAxle: cap(7.5, 'L', AXLE),
      coolant: cap(19, 'L', ELC),
      fuel: cap(190, 'L', DIESEL),
      def: cap(16, 'L', DEF),
    },
    filters: filters('TM-YH135', [...ENGINE_FILTERS, 'hydraulic', 'cab', 'def']),
    tyrePressures: {
      front: { value: 1.6, unit: 'bar', note: '480/65R24, loader work' },
      rear: { value: 1.4, unit: 'bar', note: '540/65R38' },
    },
    torques: [
      { name: 'Front wheel nuts', value: 500, unit: 'Nm', note: '' },
      { name: 'Rear wheel nuts', value: 600, unit: 'Nm', note: '' },
    ],
    testPressures: [
      test('PTO clutch pressure', [2000, 2200], 'kPa', 2100, [50, 'C'], 'PTO engaged'),
      test('Loader relief pressure', [190, 200], 'bar', 2200, [50, 'C']),
    ],
  },
  'FH-01': {
    capacities: {
      engineOil: cap(48, 'L', ENGINE_OIL),
      hydraulicTransmission: cap(110, 'L', 'ISO VG 46 hydraulic oil'),
      rearAxle: cap(12, 'L', AXLE),
      coolant: cap(90, 'L', ELC),
      fuel: cap(1050, 'L', DIESEL),
      def: cap(130, 'L', DEF),
    },
    filters: filters('HL-CW600', [...ENGINE_FILTERS, 'hydraulic', 'cab', 'def']),
    tyrePressures: { front: { value: 2.2, unit: 'bar', note: '800/70R32' } },
    testPressures: [test('Feed roll drive pressure', [240, 260], 'bar', 1900, [55, 'C'])],
  },
  'TH-01': {
    capacities: {
      engineOil: cap(12, 'L', ENGINE_OIL),
      hydraulicTransmission: cap(140, 'L', 'ISO VG 46 hydraulic oil'),
      frontAxle: cap(8, 'L', AXLE),
      rearAxle: cap(8, 'L', AXLE),
      coolant: cap(22, 'L', ELC),
      fuel: cap(140, 'L', DIESEL),
    },
    filters: filters('TM-LA635', [...ENGINE_FILTERS, 'hydraulic', 'cab']),
    tyrePressures: {
      front: { value: 4.1, unit: 'bar', note: '460/70R24' },
      rear: { value: 4.1, unit: 'bar', note: '460/70R24' },
    },
    torques: [{ name: 'Wheel nuts', value: 540, unit: 'Nm', note: '' }],
    testPressures: [test('Boom relief pressure', [250, 260], 'bar', 2200, [50, 'C'])],
  },
  'MW-01': {
    extraCapacities: [{ name: 'Planetary gearbox', quantity: 9, unit: 'L', spec: 'SAE 80W-90' }],
    tyrePressures: { front: { value: 5, unit: 'bar', note: '' } },
  },
  'ST-01': {
    extraCapacities: [
      { name: 'Vacuum pump oil tank', quantity: 5, unit: 'L', spec: 'Vacuum pump oil' },
    ],
    tyrePressures: { front: { value: 2.4, unit: 'bar', note: '750/60R30.5' } },
    torques: [{ name: 'Wheel nuts', value: 650, unit: 'Nm', note: '' }],
  },
};

export const DEMO_SPEC_SHEETS: {
  organization: 'larkspur' | 'osier';
  sheets: Record<string, Sheet>;
}[] = [
  { organization: 'larkspur', sheets: LARKSPUR },
  { organization: 'osier', sheets: OSIER },
];
