// The built-in walkarounds of trailed machines (checked hitched, the tractor's engine stopped;
// the lights from the tractor's seat) and of farm trucks: common practice. A truck ends in the
// seat too (brakes, parking brake, steering), but has no split brake pedals to latch.
import type { MachineCategory } from '../../shared/constants';
import { COMMON_PRACTICE, I, item, type ChecklistDefinition } from './checklist-items';

/** The lists of the trailed categories and of trucks. */
export const TOWED_AND_ROAD_CHECKLISTS: Record<
  Extract<MachineCategory, 'baler' | 'truck' | 'implement'>,
  ChecklistDefinition
> = {
  baler: {
    name: 'Baler — daily walkaround',
    description: `Daily walkaround for balers, with the tractor hitched and the engine stopped. ${COMMON_PRACTICE}`,
    items: [
      item(
        'pto-shaft',
        'PTO shaft guard',
        'Guard turns freely on the shaft; restraint chains fitted; slip clutch intact.',
        { critical: true, hazards: ['pto'] },
      ),
      item(
        'tailgate-lock',
        'Tailgate lock valve and props',
        'The lock valve closes and holds the open tailgate.',
        { critical: true, hazards: ['raised_load', 'hydraulic_pressure'] },
      ),
      item('pickup', 'Pickup tines and guards', 'No missing or broken tines; guards fitted.', {
        hazards: ['pto'],
      }),
      item('chains', 'Drive chains and belts', 'Tension, wear and tracking; no torn belts.', {
        hazards: ['stored_energy'],
      }),
      I.hoses,
      I.tyrePressure,
      I.wheelNuts,
      I.hitch,
      I.smv,
      I.extinguisher,
      I.lights,
    ],
  },
  truck: {
    name: 'Truck — daily walkaround',
    description: `Daily pre-trip walkaround for farm trucks. ${COMMON_PRACTICE}`,
    items: [
      I.engineOil,
      I.coolant,
      I.fuel,
      I.leaks,
      I.tyrePressure,
      I.tyreDamage,
      I.wheelNuts,
      I.battery,
      item(
        'body-prop',
        'Body down; body prop works',
        'Never work under a raised body without its prop.',
        {
          hazards: ['raised_load'],
        },
      ),
      item('mirrors', 'Mirrors and windscreen', 'Clean, not cracked, adjusted.'),
      item('seatbelt', 'Seatbelt', 'Latches and is not frayed.', {
        critical: true,
        phase: 'running',
      }),
      item(
        'air-brakes',
        'Brakes and air pressure',
        'Air builds to working pressure with no audible leaks; brakes hold.',
        { critical: true, hazards: ['stored_energy'], phase: 'running' },
      ),
      I.parkingBrake,
      I.steering,
      I.warningLights,
      I.lights,
    ],
  },
  implement: {
    name: 'Trailed implement — daily walkaround',
    description: `Daily walkaround for trailed implements, hitched, with the tractor's engine stopped. ${COMMON_PRACTICE}`,
    items: [
      item(
        'hitch-pin',
        'Hitch pin, clip and safety chain',
        'Pin and clip in; safety chain attached to the tractor.',
        { critical: true, hazards: ['raised_load'] },
      ),
      item(
        'pto-shaft',
        'PTO shaft guard',
        'Guard turns freely on the shaft; restraint chains fitted.',
        { critical: true, hazards: ['pto'] },
      ),
      I.hoses,
      I.tyrePressure,
      I.wheelNuts,
      item('jack', 'Parking stand stowed', 'Stand raised and pinned for transport.', {
        hazards: ['raised_load'],
      }),
      I.shields,
      I.smv,
      I.lights,
    ],
  },
};
