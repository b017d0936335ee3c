// Demo schedule templates, one per machine category. Meter intervals are in the category's usual
// meter unit (hours; km for trucks; bales for balers). Typical figures of common practice for the
// demo only: each machine's real intervals come from its operator's manual.
import type { MachineCategory, UnitSystem } from '../../shared/constants';
import type { TaskInput } from '../../shared/schemas/schedule';
import {
  calendarTasks,
  engineTasks,
  fluid,
  greaseTask,
  INSPECT_SELF_PROPELLED,
  part,
  ptoCheckTask,
  task,
  UTF,
} from './template-tasks';
import { combine, loader, mower, other, sprayer } from './templates-self-propelled';

export interface TemplateDefinition {
  category: MachineCategory;
  name: string;
  description: string;
  tasks: TaskInput[];
}

export const TEMPLATE_DESCRIPTION =
  "Typical intervals of common practice for the demo — replace them with the figures of this machine's operator's manual.";

function tractor(units: UnitSystem): TaskInput[] {
  return [
    ...engineTasks(units, {
      code: '11',
      engineOilL: 18,
      hydraulicOilL: 120,
      coolantL: 40,
      hydraulicOil: UTF,
    }),
    ptoCheckTask(),
    greaseTask(
      units,
      'Front axle, hitch and loader pivots',
      50,
      0.4,
      ['raised_load'],
      'Grease every fitting on the front axle, three-point hitch and loader pivots; wipe off the old grease.',
    ),
    ...calendarTasks({ inspection: `${INSPECT_SELF_PROPELLED} Hitch pins, drawbar, PTO guards.` }),
  ];
}

function baler(units: UnitSystem): TaskInput[] {
  return [
    greaseTask(
      units,
      'Grease points and drive chains',
      1000,
      0.3,
      ['pto', 'stored_energy'],
      'Grease the chart points and oil the drive chains; check chain tension.',
    ),
    task({
      name: 'Pickup, rollers and belts inspection',
      intervalMeter: 2500,
      warnMeter: 250,
      warnDays: 14,
      parts: [part('HS-PT-1740', 'Pickup tine', 6)],
      labourHours: 1,
      instructions:
        'Replace broken pickup tines, check belt or roller wear and tracking, net or twine knife sharpness.',
      hazards: ['pto', 'stored_energy'],
    }),
    task({
      name: 'Main gearbox oil',
      intervalMeter: 10000,
      intervalDays: 365,
      warnMeter: 1000,
      warnDays: 30,
      fluids: [fluid(units, 'Gear oil 80W-90', 6, 'L')],
      labourHours: 0.75,
      instructions: 'Drain warm, clean the magnetic plug, refill to the level plug.',
      hazards: ['hot_fluid'],
    }),
    task({
      name: 'PTO shaft, guards and slip clutch',
      intervalMeter: 2500,
      warnMeter: 250,
      warnDays: 14,
      labourHours: 0.5,
      instructions:
        'Check the shaft guard turns freely and its chains are fitted, grease the cross journals, check the slip clutch.',
      hazards: ['pto', 'stored_energy'],
    }),
    ...calendarTasks({
      inspection:
        'Lights and reflectors, slow-moving-vehicle sign, tailgate lock valve, guards, tyres and wheel nuts, hitch and safety chain.',
      battery: false,
    }),
  ];
}

function truck(units: UnitSystem): TaskInput[] {
  return [
    task({
      name: 'Engine oil and filter',
      intervalMeter: 15000,
      intervalDays: 365,
      warnMeter: 1500,
      warnDays: 30,
      parts: [part('HS-OF-1920', 'Engine oil filter, cartridge')],
      fluids: [fluid(units, 'Engine oil 10W-30, heavy duty', 38, 'L')],
      labourHours: 1,
      instructions:
        'Drain warm oil, replace the filter, refill and check the level after a short run.',
      hazards: ['hot_fluid'],
    }),
    task({
      name: 'Fuel filters',
      intervalMeter: 30000,
      warnMeter: 3000,
      warnDays: 14,
      parts: [
        part('HS-FF-1924', 'Fuel filter / water separator'),
        part('HS-FF-1925', 'Secondary fuel filter'),
      ],
      labourHours: 0.75,
      instructions: 'Replace both filters, drain the separator and prime. No open flames.',
    }),
    task({
      name: 'Air filter inspection',
      intervalMeter: 15000,
      warnMeter: 1500,
      warnDays: 14,
      parts: [part('HS-AF-1926', 'Air filter element')],
      labourHours: 0.3,
      instructions:
        'Check the restriction indicator and the element (HS-AF-1926); replace when restricted.',
    }),
    task({
      name: 'Transmission and axle oil',
      intervalMeter: 100000,
      intervalDays: 730,
      warnMeter: 10000,
      warnDays: 60,
      fluids: [fluid(units, 'Gear oil 75W-90, synthetic', 28, 'L')],
      labourHours: 2,
      instructions:
        'Drain transmission and drive axle warm, clean the magnetic plugs, refill to the level plugs.',
      hazards: ['hot_fluid'],
    }),
    task({
      name: 'Coolant',
      intervalMeter: 150000,
      intervalDays: 1095,
      warnMeter: 15000,
      warnDays: 90,
      fluids: [fluid(units, 'Coolant, extended-life, 50/50 premix', 45, 'L')],
      labourHours: 2,
      instructions:
        'Drain and refill the cooling system cold and bleed air; check hoses and the cap.',
      hazards: ['hot_fluid'],
    }),
    task({
      name: 'Brakes and air system inspection',
      intervalMeter: 20000,
      intervalDays: 180,
      warnMeter: 2000,
      warnDays: 14,
      labourHours: 1.5,
      instructions: 'Check lining wear, slack adjusters, air leaks and drain the air tanks.',
      safetyNotes:
        'Chock the wheels. Spring brake chambers hold a strong spring: never take one apart.',
      hazards: ['stored_energy'],
    }),
    greaseTask(
      units,
      'Chassis and body hinge grease',
      5000,
      0.5,
      ['raised_load'],
      'Grease the chassis, steering and body hinge points with the body down or on its prop.',
    ),
    task({
      name: 'Hoist and tailgate check',
      intervalDays: 365,
      warnDays: 30,
      labourHours: 1,
      instructions: 'Check hoist cylinder, hoses, body prop, tailgate latches and the grain door.',
      hazards: ['raised_load', 'hydraulic_pressure'],
    }),
    ...calendarTasks({
      inspection:
        'Roadworthiness as local rules require: lights, tyres and wheel nuts, steering, mirrors, load securing, horn and wipers.',
    }),
  ];
}

function implement(units: UnitSystem): TaskInput[] {
  return [
    greaseTask(
      units,
      'Grease points',
      50,
      0.3,
      ['pto'],
      'Grease the chart points, PTO shaft cross journals and guard bearings.',
    ),
    task({
      name: 'Gearbox oil',
      intervalMeter: 500,
      intervalDays: 365,
      warnMeter: 50,
      warnDays: 30,
      fluids: [fluid(units, 'Gear oil 80W-90', 5, 'L')],
      labourHours: 0.75,
      instructions: 'Drain warm, clean the magnetic plug, refill to the level plug.',
      hazards: ['hot_fluid'],
    }),
    task({
      name: 'PTO shaft and guard check',
      intervalMeter: 250,
      warnMeter: 25,
      warnDays: 14,
      labourHours: 0.5,
      instructions:
        'Check the guard turns freely, its restraint chains are fitted and the shaft overlap is right.',
      hazards: ['pto', 'stored_energy'],
    }),
    task({
      name: 'Hydraulic hoses and rams check',
      intervalMeter: 500,
      warnMeter: 50,
      warnDays: 14,
      labourHours: 0.75,
      instructions: 'Look for chafed or weeping hoses, leaking seals and loose fittings.',
      hazards: ['hydraulic_pressure', 'raised_load'],
    }),
    task({
      name: 'Tyres, wheel nuts and hitch',
      intervalMeter: 250,
      intervalDays: 180,
      warnMeter: 25,
      warnDays: 14,
      labourHours: 0.5,
      instructions:
        'Check tyre pressure and damage, torque the wheel nuts, check the drawbar eye, jack and safety chain.',
    }),
    ...calendarTasks({
      inspection:
        'Lights and reflectors, slow-moving-vehicle sign, brakes and breakaway where fitted, guards and shields, hitch.',
      battery: false,
      extinguisher: false,
    }),
  ];
}

const BUILDERS: Record<MachineCategory, [string, (units: UnitSystem) => TaskInput[]]> = {
  tractor: ['Tractor', tractor],
  combine: ['Combine', combine],
  sprayer: ['Self-propelled sprayer', sprayer],
  baler: ['Round baler (bales)', baler],
  loader: ['Loader / telehandler', loader],
  mower: ['Self-propelled mower-conditioner', mower],
  truck: ['Truck (km)', truck],
  implement: ['Trailed implement (hour counter)', implement],
  other: ['Other self-propelled machine', other],
};

/** The demo schedule template of every category, with fluids in the farm's units. */
export function buildTemplates(units: UnitSystem): TemplateDefinition[] {
  return Object.entries(BUILDERS).map(([category, [label, build]]) => ({
    category: category as MachineCategory,
    name: `${label} — typical schedule`,
    description: TEMPLATE_DESCRIPTION,
    tasks: build(units),
  }));
}
