// Yard machines: telehandler, mixer wagon, slurry tanker. Common practice, not manufacturers'
// figures; the machine's operator's manual wins.
import type { TaskInput } from '../../schemas/schedule';
import {
  calendarTasks,
  engineTasks,
  gearboxOil,
  grease,
  INSPECT_SELF_PROPELLED,
  INSPECT_TRAILED,
  libTask,
  ptoShaft,
  wear,
  wheelNuts,
} from './common';
import { storageService } from './season';

const LOCK_OUT =
  'Disengage the PTO, stop the tractor, take the key and wait until everything has stopped. ';

function telehandler(): TaskInput[] {
  return [
    ...engineTasks(),
    grease(
      'Boom pivots and carriage pins',
      10,
      ['raised_load', 'hydraulic_pressure'],
      'Boom fully lowered and retracted. Grease the boom pivot, lift and tilt cylinder ends, carriage and attachment pins: daily work, about every 10 h.',
    ),
    libTask({
      name: 'Boom wear pads and extension',
      intervalMeter: 250,
      labourHours: 1,
      hazards: ['raised_load'],
      parts: [wear('Boom wear pad, as worn', 2)],
      instructions:
        'Boom lowered. Check the wear pads, extension chains or cylinder and the boom sections for cracks; shim or replace pads only when worn.',
    }),
    libTask({
      name: 'Axle and hub oil',
      intervalMeter: 1000,
      intervalDays: 730,
      labourHours: 1.5,
      hazards: ['hot_fluid'],
      instructions: "Drain both axles and their hubs warm; refill with the manual's oil.",
    }),
    libTask({
      name: 'Load-moment indicator and safety devices',
      intervalMeter: 250,
      intervalDays: 90,
      labourHours: 0.3,
      hazards: ['raised_load', 'power_lines'],
      instructions:
        'Test the load-moment indicator, boom cut-outs, seat switch and reversing alarm as the manual describes; keep clear of overhead lines when raising the boom.',
    }),
    wheelNuts(),
    libTask({
      name: 'Thorough examination of lifting equipment',
      intervalDays: 365,
      labourHours: 2,
      hazards: ['raised_load'],
      instructions:
        'Have the machine and its attachments examined by a competent person as often as local regulations require (often every 12 months, 6 when lifting people); keep the report.',
    }),
    ...calendarTasks(`${INSPECT_SELF_PROPELLED} Load chart in the cab, attachment locks.`),
  ];
}

function mixerWagon(): TaskInput[] {
  return [
    ptoShaft(),
    grease(
      'Daily grease points',
      10,
      ['pto'],
      `${LOCK_OUT}Grease the door slides, conveyor shafts and the drawbar points of the chart.`,
    ),
    libTask({
      name: 'Auger knives and flighting',
      intervalMeter: 50,
      labourHours: 1,
      hazards: ['pto', 'stored_energy'],
      parts: [wear('Auger knife, as worn', 4), wear('Counter knife, as worn')],
      instructions: `${LOCK_OUT}Never climb into the tub unless the PTO shaft is uncoupled and the key is in your pocket. Check the knives' edges and bolts and the flighting for wear; turn or replace knives only when worn.`,
    }),
    libTask({
      name: 'Weigh cells and indicator check',
      intervalDays: 90,
      labourHours: 0.5,
      instructions:
        'Check the weigher against a known weight (a full bag or a weighed load); inspect the weigh cells, cables and junction box for damage and damp; recalibrate as the manual says.',
    }),
    gearboxOil('Planetary gearbox oil', 'Planetary gearbox(es) under the tub.'),
    libTask({
      name: 'Discharge door and conveyor chains',
      intervalMeter: 50,
      labourHours: 0.5,
      hazards: ['hydraulic_pressure', 'pto'],
      parts: [wear('Conveyor chain or belt, as worn')],
      instructions: `${LOCK_OUT}Check the door cylinders and hoses, conveyor chain or belt tension and wear.`,
    }),
    wheelNuts(),
    ...calendarTasks(INSPECT_TRAILED, false, ['tyres_rims']),
  ];
}

function slurryTanker(): TaskInput[] {
  return [
    ptoShaft(),
    libTask({
      name: 'Vacuum-pump oil',
      intervalMeter: 8,
      labourHours: 0.2,
      hazards: ['pto', 'hot_fluid'],
      instructions: `${LOCK_OUT}Check and top up the vacuum pump's lubricating oil reservoir with the manual's oil (the pump uses it up as it runs); check the drip feed reaches the vanes.`,
    }),
    libTask({
      name: 'Vacuum pump vanes and valves',
      intervalMeter: 500,
      intervalDays: 365,
      labourHours: 2,
      hazards: ['stored_energy', 'pto'],
      parts: [wear('Pump vane, as worn', 4)],
      instructions: `${LOCK_OUT}Release all vacuum or pressure from the tank first. Measure vane height, clean the four-way valve and the primary and secondary shut-offs (float valve, moisture trap).`,
    }),
    libTask({
      name: 'Pressure relief and vacuum valves test',
      intervalDays: 365,
      labourHours: 0.5,
      hazards: ['stored_energy'],
      instructions:
        'Check that the pressure relief and vacuum relief valves open at the settings the manual gives; a stuck valve can burst or implode the tank. Slurry gives off deadly gases: work in the open, never enter the tank.',
    }),
    grease(
      'Running gear and hitch grease points',
      50,
      ['pto', 'hitching_crush'],
      `${LOCK_OUT}Grease the axle and steering pivots, brake shafts and the hitch.`,
    ),
    libTask({
      name: 'Brakes and hubs',
      intervalMeter: 500,
      intervalDays: 365,
      labourHours: 2,
      hazards: ['raised_load'],
      instructions:
        'Tank empty. Check brake adjustment and linings and the hub bearing play; re-pack hubs as the manual says. The axle rests on stands, never on the jack.',
    }),
    wheelNuts(),
    // within a week of the spreading season's end, before frost reaches the pump and valves
    storageService(7, {
      name: 'Storage service',
      labourHours: 2,
      hazards: ['stored_energy', 'pto'],
      instructions: `${LOCK_OUT}Release all vacuum or pressure, then in the open: flush the tank, pump, valves and spreading gear with clean water and leave the drain valves open against frost. Top up the vacuum-pump oil and grease every point. Slurry gives off deadly gases: never enter the tank, not even an empty one.`,
    }),
    ...calendarTasks(INSPECT_TRAILED, false, ['tyres_rims']),
  ];
}

export const YARD_CLASSES = {
  telehandler: {
    description: 'A telescopic handler working with buckets, forks and bale handlers.',
    tasks: telehandler,
  },
  mixer_wagon: {
    description: 'A trailed feed mixer wagon with vertical or horizontal augers and a weigher.',
    tasks: mixerWagon,
  },
  slurry_tanker: {
    description: 'A trailed vacuum slurry tanker.',
    tasks: slurryTanker,
  },
} as const;
