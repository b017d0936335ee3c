// Grain truck (counted in km) and a generic trailed or mounted implement. Common practice, not
// manufacturers' figures; the machine's operator's manual wins.
import type { TaskInput } from '../../schemas/schedule';
import {
  calendarTasks,
  gearboxOil,
  grease,
  INSPECT_TRAILED,
  libTask,
  ptoShaft,
  wear,
  wheelNuts,
} from './common';
import { preSeasonService, storageService } from './season';

function grainTruck(): TaskInput[] {
  return [
    libTask({
      name: 'Engine oil and filter',
      intervalMeter: 20000,
      intervalDays: 365,
      labourHours: 1,
      hazards: ['hot_fluid'],
      instructions:
        "Drain warm oil, replace the filter, refill with the manual's grade to the full mark.",
    }),
    libTask({
      name: 'Fuel filters and water separator',
      intervalMeter: 40000,
      intervalDays: 365,
      labourHours: 0.75,
      instructions:
        'Replace the fuel filters, drain the water separator and prime the system. No open flames.',
    }),
    libTask({
      name: 'Engine air filter',
      intervalMeter: 40000,
      intervalDays: 365,
      labourHours: 0.3,
      instructions: 'Replace the air filter element; check the housing and intake for leaks.',
    }),
    libTask({
      name: 'Transmission and axle oil',
      intervalMeter: 100000,
      intervalDays: 730,
      labourHours: 2,
      hazards: ['hot_fluid'],
      instructions: "Drain the gearbox and the drive axle(s) warm; refill with the manual's oils.",
    }),
    libTask({
      name: 'Brakes and air system',
      intervalMeter: 10000,
      intervalDays: 180,
      labourHours: 1,
      hazards: ['stored_energy'],
      instructions:
        'Check lining wear, slack adjusters, air leaks and the air dryer; drain the air tanks. Spring brake chambers hold great force: never open one.',
    }),
    grease(
      'Chassis and tipper body grease points',
      2000,
      ['raised_load'],
      'Body lowered, or raised on its safety prop. Grease the chassis points, the body hinges and the hoist pivots.',
    ),
    libTask({
      name: 'Tipper hoist and body check',
      intervalDays: 365,
      labourHours: 1,
      hazards: ['raised_load', 'hydraulic_pressure', 'power_lines'],
      instructions:
        'Body on its safety prop. Check the hoist cylinder, hoses, tailgate locks and the body-up warning. Tip only where the body cannot reach overhead lines.',
    }),
    libTask({
      name: 'DPF and DEF check',
      intervalMeter: 40000,
      intervalDays: 365,
      labourHours: 0.5,
      hazards: ['chemicals'],
      instructions:
        'Read the aftertreatment faults and soot load; replace the DEF filter at the interval the manual gives; use only fresh DEF.',
    }),
    libTask({
      name: 'Coolant freeze-point test before winter',
      intervalDays: 365,
      labourHours: 0.2,
      hazards: ['hot_fluid'],
      instructions:
        'Each autumn, test the freeze point with a refractometer; open the cap only cold.',
    }),
    wheelNuts('km'),
    preSeasonService(14, {
      name: 'Pre-harvest body and hoist check',
      labourHours: 1,
      hazards: ['raised_load', 'hydraulic_pressure', 'power_lines'],
      instructions:
        'Two weeks before harvest, body on its safety prop: check the grain door and tailgate seals (grain leaks on the road), the tarp and its roller, the hoist hoses for leaks and the body-up warning. Tip only where the body cannot reach overhead lines.',
    }),
    libTask({
      name: 'Annual roadworthiness test',
      intervalDays: 365,
      labourHours: 3,
      instructions:
        'Have the truck tested as local road regulations require; keep the certificate.',
    }),
    ...calendarTasks('Lights, mirrors, horn, seat belts, tyres and load restraints.', true, [
      'tyres_rims',
    ]),
  ];
}

function implement(): TaskInput[] {
  return [
    ptoShaft(),
    grease(
      'Daily grease points',
      10,
      ['raised_load'],
      'Lower the implement or block it on stands. Grease the pivots, bearings and wheels of the chart.',
    ),
    libTask({
      name: 'Wear parts: tines, points, discs and knives',
      intervalMeter: 50,
      labourHours: 1,
      hazards: ['raised_load'],
      parts: [wear('Tine, point or disc, as worn', 4)],
      instructions:
        'Lower the implement or block it on stands. Check the soil-engaging or cutting parts for wear and damage; turn or replace only what is worn. Check bolts for tightness.',
    }),
    gearboxOil('Gearbox oil', 'Each gearbox of the implement.'),
    libTask({
      name: 'Hydraulic hoses and couplers',
      intervalMeter: 250,
      intervalDays: 365,
      labourHours: 0.3,
      hazards: ['hydraulic_pressure'],
      instructions:
        'Relieve pressure. Look for chafed hoses, cracked ends and leaking couplers; replace a damaged hose before the next use.',
    }),
    libTask({
      name: 'Hitch and linkage pins check',
      intervalMeter: 250,
      labourHours: 0.3,
      hazards: ['hitching_crush'],
      instructions:
        'Check hitch pins, linch pins and the drawbar eye for wear and cracks. Nobody between tractor and implement while hitching.',
    }),
    wheelNuts(),
    storageService(14, {
      name: 'Storage: clean and protect',
      labourHours: 2,
      hazards: ['raised_load', 'hydraulic_pressure'],
      instructions:
        'After the season: clean, grease everything, oil bright soil-engaging parts, relieve hydraulic pressure, store lowered or on stands under cover.',
    }),
    libTask({
      name: 'Annual safety inspection',
      intervalDays: 365,
      labourHours: 1,
      hazards: ['tyres_rims'],
      instructions: INSPECT_TRAILED,
    }),
  ];
}

export const ROAD_AND_OTHER_CLASSES = {
  grain_truck: {
    description: 'A grain truck with a tipping body, counted in km.',
    tasks: grainTruck,
  },
  implement: {
    description: 'Any other trailed or mounted implement (tillage, drill, rake, tedder…).',
    tasks: implement,
  },
} as const;
