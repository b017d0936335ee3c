// The pieces of the built-in walkaround checklists: the hazard cautions (shared/domain/hazards.ts), the item
// builder and the items several categories share. The lists themselves are in
// checklist-self-propelled.ts and checklist-towed-road.ts, the items of one machine class in
// checklist-class-items.ts; checklist-defaults.ts picks one. Each item has its phase: walked round
// before start (engine off, key out) or checked from the seat with the engine running.
import { hazardCautionText } from '../../shared/domain/hazards';
import type { MachineClass } from '../../shared/domain/service-library/classes';
import type { Hazard } from '../../shared/schemas/schedule';
import type { ChecklistPhase } from '../../shared/schemas/walkarounds';
import type { ChecklistItem } from '../models/walkaround';

/**
 * The caution of an item's hazards: shared/domain/hazards.ts, the one table the task cautions and
 * e-mails use too (each hazard's line, then the deferral once).
 */
export const cautionFor = (hazards: Hazard[]) => hazardCautionText(hazards);

export const item = (
  id: string,
  label: string,
  guidance: string,
  opts: {
    critical?: boolean;
    hazards?: Hazard[];
    /** default before_start */
    phase?: ChecklistPhase;
    /** only on machines of these classes (default: every machine of the list's category) */
    classes?: MachineClass[];
  } = {},
): ChecklistItem => ({
  id,
  label,
  guidance,
  critical: opts.critical ?? false,
  hazards: opts.hazards ?? [],
  caution: cautionFor(opts.hazards ?? []),
  phase: opts.phase ?? 'before_start',
  classes: opts.classes ?? [],
});

const running = 'running' as const;

// Items several categories share. Before start: engine off, key out, on level ground, everything
// lowered. Running: from the seat, the parking brake on, in a clear area.
export const I = {
  engineOil: item('engine-oil', 'Engine oil level', 'Between the marks on the dipstick.', {
    hazards: ['hot_fluid'],
  }),
  coolant: item('coolant', 'Coolant level', 'Check in the overflow tank, cold.', {
    hazards: ['hot_fluid'],
  }),
  fuel: item('fuel', 'Fuel level', 'Enough for the job; cap closed and sealed.'),
  hydraulicOil: item(
    'hydraulic-oil',
    'Hydraulic oil level',
    'With everything lowered to the ground, on the sight glass or dipstick.',
    { hazards: ['hydraulic_pressure'] },
  ),
  leaks: item(
    'leaks',
    'Leaks under the machine',
    'No fresh puddles or drips of oil, coolant, fuel or hydraulic oil.',
    { hazards: ['hydraulic_pressure'] },
  ),
  tyrePressure: item(
    'tyre-inflation',
    "Tyre inflation as the operator's manual says",
    'No tyre visibly low; check the pressure with a gauge when in doubt.',
    { hazards: ['tyres_rims'] },
  ),
  tyreDamage: item(
    'tyre-damage',
    'Cuts in treads and sidewalls',
    'No cuts, bulges or exposed cords.',
  ),
  wheelNuts: item('wheel-nuts', 'Wheel nuts', 'All present and tight; no rust streaks.', {
    critical: true,
  }),
  battery: item(
    'battery',
    'Battery hold-down and connections',
    'Held down firmly; terminals clean and tight; no cracks in the case.',
    { hazards: ['battery'] },
  ),
  cracked: item(
    'cracked-parts',
    'Cracked or broken parts',
    'Frame, hitch, mirrors, steps, handrails: nothing cracked, bent or broken.',
  ),
  hoses: item(
    'hoses',
    'Hydraulic hoses and fittings',
    'No damage, chafing, kinks or wet fittings.',
    { critical: true, hazards: ['hydraulic_pressure'] },
  ),
  shields: item(
    'shields',
    'All shields and guards in place',
    'Every shield and guard fitted and undamaged (OSHA 29 CFR 1928.57).',
    { critical: true, hazards: ['pto', 'stored_energy'] },
  ),
  ptoShield: item(
    'pto-master-shield',
    'PTO master shield in place',
    'Fitted and undamaged; stub shaft cap on when no shaft is connected (OSHA 29 CFR 1928.57).',
    { critical: true, hazards: ['pto'] },
  ),
  bolts: item('loose-bolts', 'Loose or missing bolts', 'Wheels, hitch, cab, loader mounts.'),
  smv: item(
    'smv-emblem',
    'Slow-moving-vehicle emblem',
    'Clean, not faded, mounted point up at the rear.',
  ),
  steps: item('steps', 'Steps and platform clean', 'No mud, oil, ice or loose tools.'),
  hitch: item(
    'hitch',
    'Hitch, drawbar and linkage pins',
    'Pins and clips in place; three-point linkage and drawbar secure; implements lowered.',
    { hazards: ['raised_load', 'hitching_crush'] },
  ),
  belts: item(
    'belts',
    'Fan and drive belts',
    'No cracks or fraying; tension as the manual says (engine stopped).',
    { hazards: ['stored_energy'] },
  ),
  extinguisher: item(
    'extinguisher',
    'Fire extinguisher',
    'On board, gauge in the green, seal intact.',
  ),
  // In the seat, engine running
  rops: item(
    'rops-seatbelt',
    'Rollover protective structure and seatbelt',
    'ROPS up and locked or cab undamaged; seatbelt latches and is not frayed (OSHA 29 CFR 1928.51).',
    { critical: true, phase: running },
  ),
  oilPressure: item(
    'oil-pressure',
    'Oil pressure after start',
    'After starting: the warning light goes out and the gauge reads in range within seconds. If not, stop the engine.',
    { critical: true, phase: running },
  ),
  warningLights: item(
    'warning-lights',
    'Gauges and warning lights',
    'Every warning light goes out once running; charge, temperature and fuel read normal. A light that stays on: stop and ask.',
    { phase: running },
  ),
  steering: item(
    'steering',
    'Steering free play and response',
    'Engine running: little free play at the wheel, it turns lock to lock without binding or knocking and the wheels follow at once.',
    { critical: true, phase: running },
  ),
  brakes: item(
    'brakes',
    'Service brakes',
    'Pedals firm, not spongy; at walking pace in a clear area the machine stops straight.',
    { critical: true, phase: running },
  ),
  parkingBrake: item(
    'parking-brake',
    'Parking brake',
    'Holds the machine against a gentle pull in gear at low idle; its warning light comes on when set.',
    { critical: true, phase: running },
  ),
  pedalLatch: item(
    'brake-pedal-latch',
    'Brake pedal latch',
    'Split left and right brake pedals latch together for the road and release for field turns; a single pedal returns freely.',
    { critical: true, phase: running },
  ),
  lights: item(
    'lights',
    'Lights and flashers',
    'Head, tail, brake and hazard lights and beacons work.',
    { phase: running },
  ),
  horn: item('alarm', 'Horn and reverse alarm', 'Both sound.', { phase: running }),
};

/** The items every self-propelled list ends with: from the seat, engine running. */
export const IN_SEAT = [
  I.rops,
  I.oilPressure,
  I.warningLights,
  I.steering,
  I.brakes,
  I.parkingBrake,
  I.pedalLatch,
  I.lights,
  I.horn,
];

// The cooling and air intake of the harvesters, which plug with chaff in a day.
export const COOLING: ChecklistItem[] = [
  item(
    'radiator',
    'Radiator and coolers clean',
    'Radiator, oil and charge-air coolers: fins clear of chaff and dust. Blow them out from the clean side with the engine stopped.',
    { hazards: ['hot_fluid'] },
  ),
  item(
    'rotary-screen',
    'Rotary screen clean and free',
    'Screen clear of chaff, seals in place, the drum turns freely by hand with the engine stopped; after start it turns and stays clean.',
  ),
  item(
    'precleaner',
    'Air precleaner and dust valve',
    'Precleaner not plugged and its bowl empty; the rubber dust valve is soft, shut and not split.',
  ),
];

export interface ChecklistDefinition {
  name: string;
  description: string;
  items: ChecklistItem[];
}

export const COMMON_PRACTICE =
  'Items are common practice for this kind of machine, on the pattern of published tractor daily ' +
  "inspection lists; your operator's manual and local rules come first. Walk round first with " +
  'the engine stopped, the key removed and everything lowered; then check the rest from the seat ' +
  'with the engine running.';
