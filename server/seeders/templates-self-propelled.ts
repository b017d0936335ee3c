// Demo schedule templates of self-propelled harvest, spraying and handling machines (hour meters).
// Typical figures of common practice for the demo only; real intervals come from each manual.
import type { UnitSystem } from '../../shared/constants';
import type { TaskInput } from '../../shared/schemas/schedule';
import {
  calendarTasks,
  engineTasks,
  fluid,
  greaseTask,
  HYD46,
  INSPECT_SELF_PROPELLED,
  part,
  task,
} from './template-tasks';

export function combine(units: UnitSystem): TaskInput[] {
  return [
    ...engineTasks(units, {
      code: '18',
      engineOilL: 32,
      hydraulicOilL: 95,
      coolantL: 70,
      hydraulicOil: HYD46,
    }),
    greaseTask(
      units,
      'Daily grease points',
      10,
      0.3,
      ['raised_load', 'stored_energy'],
      'Grease the daily points of the chart (feeder house, header drive, unloading auger); header lowered or on its lock.',
    ),
    task({
      name: 'Belts, chains and feeder house check',
      intervalMeter: 250,
      warnMeter: 25,
      warnDays: 14,
      parts: [part('HS-DB-1830', 'Rotor drive belt', 1)],
      labourHours: 1.5,
      instructions:
        'Check tension and wear of belts and chains, feeder chain slats and sprockets; replace the rotor belt when glazed or cracked.',
      hazards: ['stored_energy', 'raised_load'],
    }),
    ...calendarTasks({
      inspection: `${INSPECT_SELF_PROPELLED} Header lock, chaff and dust clean-down, electrical wiring near hot parts.`,
    }),
  ];
}

export function sprayer(units: UnitSystem): TaskInput[] {
  return [
    ...engineTasks(units, {
      code: '15',
      engineOilL: 24,
      hydraulicOilL: 130,
      coolantL: 45,
      hydraulicOil: HYD46,
    }),
    task({
      name: 'Nozzles, strainers and line filters',
      intervalMeter: 50,
      warnMeter: 5,
      parts: [part('HS-SN-1530', 'Line strainer screen, 50 mesh', 2)],
      labourHours: 0.75,
      instructions:
        'Rinse the system first. Clean strainers and filters, check nozzle flow and pattern, replace worn tips.',
      hazards: ['chemicals'],
    }),
    task({
      name: 'Boom fold and breakaway check',
      intervalMeter: 250,
      warnMeter: 25,
      warnDays: 14,
      labourHours: 1,
      instructions:
        'Check boom fold cylinders, hoses, breakaway springs and pivot wear; grease the boom pivots.',
      hazards: ['raised_load', 'hydraulic_pressure'],
    }),
    task({
      name: 'Sprayer calibration',
      intervalDays: 365,
      warnDays: 30,
      labourHours: 1.5,
      instructions:
        'Measure nozzle output and ground speed and compare the application rate with the controller.',
    }),
    ...calendarTasks({
      inspection: `${INSPECT_SELF_PROPELLED} Chemical tank lid, rinse tank and hand-wash water.`,
    }),
  ];
}

export function loader(units: UnitSystem): TaskInput[] {
  return [
    ...engineTasks(units, {
      code: '14',
      engineOilL: 14,
      hydraulicOilL: 110,
      coolantL: 28,
      hydraulicOil: HYD46,
    }),
    greaseTask(
      units,
      'Boom, pivots and attachment carrier',
      50,
      0.4,
      ['raised_load'],
      'Grease the boom, tilt and carriage pins with the boom down.',
    ),
    task({
      name: 'Axles and service brake check',
      intervalMeter: 1000,
      intervalDays: 365,
      warnMeter: 100,
      warnDays: 30,
      fluids: [fluid(units, 'Axle oil, limited-slip', 16, 'L')],
      labourHours: 2,
      instructions:
        'Check axle oil, brake performance and parking brake hold; look for leaks at hubs.',
      hazards: ['stored_energy'],
    }),
    ...calendarTasks({
      inspection: `${INSPECT_SELF_PROPELLED} Lifting equipment examination as local rules require, load chart, boom lock, attachment locking pins.`,
    }),
  ];
}

export function mower(units: UnitSystem): TaskInput[] {
  return [
    ...engineTasks(units, {
      code: '16',
      engineOilL: 16,
      hydraulicOilL: 80,
      coolantL: 30,
      hydraulicOil: HYD46,
    }),
    greaseTask(
      units,
      'Daily grease points',
      10,
      0.2,
      ['raised_load'],
      'Grease the header pivots and conditioner roll bearings with the header lowered or on its lock.',
    ),
    task({
      name: 'Cutterbar, knives and discs inspection',
      intervalMeter: 50,
      warnMeter: 5,
      parts: [part('HS-KN-1630', 'Mower knife, twisted', 4)],
      labourHours: 0.75,
      instructions:
        'Check knives, bolts and disc hubs for wear or damage; replace knives in pairs.',
      hazards: ['raised_load', 'stored_energy'],
    }),
    task({
      name: 'Header gearbox oil',
      intervalMeter: 250,
      intervalDays: 365,
      warnMeter: 25,
      warnDays: 30,
      fluids: [fluid(units, 'Gear oil 80W-90', 4, 'L')],
      labourHours: 1,
      instructions: 'Drain the cutterbar and header gearboxes warm, refill to the level plugs.',
      hazards: ['hot_fluid', 'raised_load'],
    }),
    ...calendarTasks({ inspection: `${INSPECT_SELF_PROPELLED} Knife guards and curtains.` }),
  ];
}

export function other(units: UnitSystem): TaskInput[] {
  return [
    ...engineTasks(units, {
      code: '17',
      engineOilL: 28,
      hydraulicOilL: 120,
      coolantL: 60,
      hydraulicOil: HYD46,
    }),
    greaseTask(
      units,
      'Daily grease points',
      10,
      0.3,
      ['raised_load', 'stored_energy'],
      'Grease the daily points of the chart with attachments lowered or on their locks.',
    ),
    task({
      name: 'Belts, chains and knives check',
      intervalMeter: 250,
      warnMeter: 25,
      warnDays: 14,
      labourHours: 1,
      instructions:
        'Check drive belts and chains, knives and wear parts; sharpen or replace as the manual describes.',
      hazards: ['stored_energy'],
    }),
    ...calendarTasks({ inspection: INSPECT_SELF_PROPELLED }),
  ];
}
