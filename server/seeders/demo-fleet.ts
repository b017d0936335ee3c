// The invented demo scenario (see the project's SCENARIO notes): organizations, people and fleets.
// Names, farms and makes are made up; the figures are plausible, not anyone's records.
import type { MachineCategory, MeterUnit } from '../../shared/constants';
import type { SeasonProfile } from './readings-generator';

export interface DemoMachine {
  organization: 'larkspur' | 'osier';
  fleetNumber: string;
  name: string;
  category: MachineCategory;
  make: string;
  model: string;
  serialNumber: string;
  year: number;
  listPrice: number;
  purchasePrice: number;
  meterUnit: MeterUnit;
  /** lifetime meter value about now (the end of the generated history), meter units */
  aboutNow: number;
  /** typical use a year, meter units */
  perYear: number;
  season: SeasonProfile;
  /** days between readings in season, when not the usual 1–3 */
  inSeasonEvery?: [number, number];
  /** e-mails of the operators assigned to it */
  operators?: string[];
}

const ALL_YEAR: number[] = [];

export const DEMO_MACHINES: DemoMachine[] = [
  // Larkspur Flats Farm — mixed grain and hay (the SCENARIO table).
  {
    organization: 'larkspur',
    fleetNumber: 'T-01',
    name: 'Brindle 4WD tractor',
    category: 'tractor',
    make: 'Brindle',
    model: 'B-480 4WD',
    serialNumber: 'BRN4W14K00731',
    year: 2014,
    listPrice: 385000,
    purchasePrice: 342000,
    meterUnit: 'h',
    aboutNow: 6850,
    perYear: 600,
    season: { months: [3, 4, 5, 9, 10, 11], peakMonths: [4, 10] },
    operators: ['sam@larkspur.example'],
  },
  {
    organization: 'larkspur',
    fleetNumber: 'T-02',
    name: 'Tamsin MFWD row-crop tractor',
    category: 'tractor',
    make: 'Tamsin',
    model: 'RC 210 MFWD',
    serialNumber: 'TMS-RC210-19-4417',
    year: 2019,
    listPrice: 298000,
    purchasePrice: 271500,
    meterUnit: 'h',
    aboutNow: 3120,
    perYear: 470,
    season: { months: ALL_YEAR, peakMonths: [4, 5], useShare: 0.55 },
    operators: ['lena@larkspur.example'],
  },
  {
    organization: 'larkspur',
    fleetNumber: 'T-03',
    name: 'Corvid utility tractor with loader',
    category: 'tractor',
    make: 'Corvid',
    model: 'U75 with FL-20 loader',
    serialNumber: 'CVD-U75-16-0928',
    year: 2016,
    listPrice: 96000,
    purchasePrice: 88400,
    meterUnit: 'h',
    aboutNow: 1940,
    perYear: 200,
    season: { months: ALL_YEAR, useShare: 0.45, sundayShare: 0.1 },
    inSeasonEvery: [2, 5],
    operators: ['sam@larkspur.example'],
  },
  {
    organization: 'larkspur',
    fleetNumber: 'C-01',
    name: 'Harl combine',
    category: 'combine',
    make: 'Harl',
    model: 'Axial 8',
    serialNumber: 'HRL-AX8-17-0312',
    year: 2017,
    listPrice: 465000,
    purchasePrice: 419000,
    meterUnit: 'h',
    aboutNow: 2600,
    perYear: 290,
    season: { months: [8, 9, 10], peakMonths: [9, 10], useShare: 0.75, sundayShare: 0.5 },
    operators: ['lena@larkspur.example'],
  },
  {
    organization: 'larkspur',
    fleetNumber: 'S-01',
    name: 'Tamsin self-propelled sprayer',
    category: 'sprayer',
    make: 'Tamsin',
    model: 'SP 1200',
    serialNumber: 'TMS-SP12-20-0186',
    year: 2020,
    listPrice: 412000,
    purchasePrice: 376000,
    meterUnit: 'h',
    aboutNow: 1450,
    perYear: 235,
    season: { months: [4, 5, 6, 7], peakMonths: [5, 6] },
    operators: ['lena@larkspur.example'],
  },
  {
    organization: 'larkspur',
    fleetNumber: 'B-01',
    name: 'Corvid round baler',
    category: 'baler',
    make: 'Corvid',
    model: 'RB 5x6 net',
    serialNumber: 'CVD-RB56-18-2290',
    year: 2018,
    listPrice: 58500,
    purchasePrice: 52900,
    meterUnit: 'bales',
    aboutNow: 18400,
    perYear: 2350,
    season: { months: [6, 7, 8, 9], peakMonths: [6, 8], useShare: 0.45 },
    // two balers' operators through the hay season
    operators: ['sam@larkspur.example', 'lena@larkspur.example'],
  },
  {
    organization: 'larkspur',
    fleetNumber: 'M-01',
    name: 'Brindle mower-conditioner',
    category: 'mower',
    make: 'Brindle',
    model: 'W16 self-propelled',
    serialNumber: 'BRN-W16-15-0544',
    year: 2015,
    listPrice: 142000,
    purchasePrice: 129000,
    meterUnit: 'h',
    aboutNow: 1210,
    perYear: 115,
    season: { months: [6, 7, 8], peakMonths: [6], useShare: 0.5 },
    operators: ['sam@larkspur.example'],
  },
  {
    organization: 'larkspur',
    fleetNumber: 'TR-01',
    name: 'Grain truck',
    category: 'truck',
    make: 'Harl',
    model: 'Tandem grain body',
    serialNumber: 'HRL-TG-12-7781',
    year: 2012,
    listPrice: 128000,
    purchasePrice: 118000,
    meterUnit: 'km',
    aboutNow: 212000,
    perYear: 14500,
    season: { months: [8, 9, 10, 11], peakMonths: [9, 10], useShare: 0.6 },
  },
  // Osier Creek Dairy — dairy with forage (machines of our own choosing).
  {
    organization: 'osier',
    fleetNumber: 'T-11',
    name: 'Tamsin loader tractor',
    category: 'tractor',
    make: 'Tamsin',
    model: 'M 135 with FL-35 loader',
    serialNumber: 'TMS-M135-18-2204',
    year: 2018,
    listPrice: 118000,
    purchasePrice: 104500,
    meterUnit: 'h',
    aboutNow: 6320,
    perYear: 880,
    season: { months: ALL_YEAR, useShare: 0.97, sundayShare: 0.9 },
  },
  {
    organization: 'osier',
    fleetNumber: 'FH-01',
    name: 'Harl self-propelled forage harvester',
    category: 'other',
    make: 'Harl',
    model: 'FX 600',
    serialNumber: 'HRL-FX6-16-0071',
    year: 2016,
    listPrice: 395000,
    purchasePrice: 352000,
    meterUnit: 'h',
    aboutNow: 1980,
    perYear: 200,
    season: {
      months: [5, 7, 9],
      // Three silage cuts a year.
      campaigns: [
        { month: 5, firstDay: 18, days: 8 },
        { month: 7, firstDay: 6, days: 7 },
        { month: 9, firstDay: 2, days: 7 },
      ],
      useShare: 0.9,
      sundayShare: 0.7,
    },
  },
  {
    organization: 'osier',
    fleetNumber: 'ST-01',
    name: 'Corvid vacuum slurry tanker',
    category: 'implement',
    make: 'Corvid',
    model: 'VT 11000 (pump hour counter)',
    serialNumber: 'CVD-VT11-17-0459',
    year: 2017,
    listPrice: 46000,
    purchasePrice: 41200,
    meterUnit: 'h',
    aboutNow: 1260,
    perYear: 150,
    // Spreading stops over the winter closed period.
    season: { months: [2, 3, 4, 6, 7, 8, 9], peakMonths: [3, 4], useShare: 0.35 },
    inSeasonEvery: [2, 4],
  },
  {
    organization: 'osier',
    fleetNumber: 'MW-01',
    name: 'Brindle mixer wagon',
    category: 'implement',
    make: 'Brindle',
    model: 'VM 16 m³ (hour counter)',
    serialNumber: 'BRN-VM16-19-1123',
    year: 2019,
    listPrice: 52000,
    purchasePrice: 47800,
    meterUnit: 'h',
    aboutNow: 3380,
    perYear: 480,
    // Fed every day; longest in the winter housing months.
    season: { months: ALL_YEAR, peakMonths: [11, 12, 1, 2, 3], useShare: 0.97, sundayShare: 0.95 },
  },
  {
    organization: 'osier',
    fleetNumber: 'BW-01',
    name: 'Corvid baler-wrapper',
    category: 'baler',
    make: 'Corvid',
    model: 'RBW 125 combi',
    serialNumber: 'CVD-RBW-20-0377',
    year: 2020,
    listPrice: 89000,
    purchasePrice: 80500,
    meterUnit: 'bales',
    aboutNow: 9650,
    perYear: 1600,
    season: { months: [5, 6, 7, 8, 9], peakMonths: [6, 7], useShare: 0.3 },
  },
  {
    organization: 'osier',
    fleetNumber: 'TH-01',
    name: 'Tamsin telehandler',
    category: 'loader',
    make: 'Tamsin',
    model: 'TH 6.35',
    serialNumber: 'TMS-TH635-21-0650',
    year: 2021,
    listPrice: 96000,
    purchasePrice: 87000,
    meterUnit: 'h',
    aboutNow: 2640,
    perYear: 520,
    season: { months: ALL_YEAR, peakMonths: [5, 6, 7, 8, 9], useShare: 0.8, sundayShare: 0.4 },
  },
];

/** The machine with the replaced hour meter, and how long ago (days) the meter was replaced. */
export const METER_REPLACEMENT = { fleetNumber: 'T-03', daysAgo: 426 } as const;

/**
 * Tasks the demo leaves overdue, "one interval behind" (fleet number, task name). Some overdue
 * and some due-soon tasks make the due list worth looking at; most tasks stay fine.
 */
export const DEMO_OVERDUE: [string, string][] = [
  ['T-02', 'Engine oil and filter'],
  ['T-03', 'Battery check'],
  ['S-01', 'Fuel filters'],
  ['TR-01', 'Annual safety inspection'],
  ['T-11', 'Hydraulic/transmission filters'],
  ['MW-01', 'Gearbox oil'],
  ['TH-01', 'Fire extinguisher check'],
];

/** Tasks tried first when the demo needs more due-soon tasks. */
export const DEMO_DUE_SOON: [string, string][] = [
  ['T-01', 'Air filter inspection'],
  ['C-01', 'Engine oil and filter'],
  ['B-01', 'Main gearbox oil'],
  ['T-02', 'Fuel filters'],
  ['T-11', 'Engine oil and filter'],
  ['TH-01', 'Air filter inspection'],
  ['FH-01', 'Annual safety inspection'],
  ['BW-01', 'Pickup, rollers and belts inspection'],
];

/** How many due-soon tasks each farm shows (at least / at most). */
export const DUE_SOON_RANGE = { min: 4, max: 7 } as const;
