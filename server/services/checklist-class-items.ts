// Built-in walkaround items that only some machines of a category need, picked by the machine's
// service-library class (shared/domain/service-library/classes.ts): the loader of a utility
// tractor, the load-moment indicator of a telehandler, the cutterhead and screens of a forage
// harvester. A machine without a class gets none of them; the manager gives it one, or edits the
// farm's list. Common practice, written for this product; the operator's manual comes first.
import type { ChecklistItem } from '../models/walkaround';
import { COOLING, item } from './checklist-items';

/** The loader of a utility tractor: lowered before anyone walks round, then its pins and hoses. */
export const LOADER_TRACTOR = {
  lowered: item(
    'loader-lowered',
    'Loader lowered for the walkaround',
    'Bucket or tool flat on the ground before you walk round; nobody goes under a raised loader.',
    { critical: true, hazards: ['raised_load'], classes: ['utility_loader_tractor'] },
  ),
  pins: item(
    'loader-pins',
    'Loader pins, retainers and mounts',
    'Every pivot pin in place with its bolt or clip; no play or fresh wear at the pivots; mounting brackets tight.',
    { critical: true, hazards: ['raised_load'], classes: ['utility_loader_tractor'] },
  ),
  hoses: item(
    'loader-hoses',
    'Loader hoses and couplers',
    'No chafing where the hoses bend at the pivots; couplers clean and fully latched; no wet fittings.',
    { critical: true, hazards: ['hydraulic_pressure'], classes: ['utility_loader_tractor'] },
  ),
  toolLock: item(
    'tool-lock',
    'Bucket or tool locked on the carrier',
    'Both locking pins or levers fully through on each side; a tool that is not locked can fall off when raised.',
    { critical: true, hazards: ['raised_load'], classes: ['utility_loader_tractor'] },
  ),
};

/** The telehandler's load-moment indicator, tested from the seat before the first lift. */
export const LMI_TEST = item(
  'lmi-test',
  'Load-moment indicator test',
  "Boom lowered and retracted, engine running: run the indicator's own test as the operator's manual describes; every light and the alarm work. Never test it by lifting more than the load chart allows. If it fails, do not lift.",
  {
    critical: true,
    hazards: ['raised_load', 'power_lines'],
    phase: 'running',
    classes: ['telehandler'],
  },
);

const forage = (i: ChecklistItem): ChecklistItem => ({ ...i, classes: ['forage_harvester'] });

/** A self-propelled forage harvester's own items: the combine's cooling and intake, its cutterhead. */
export const FORAGE_HARVESTER: ChecklistItem[] = [
  ...COOLING.map(forage),
  item(
    'cutterhead',
    'Cutterhead knives and shear bar',
    'Only once the cutterhead has stopped (it runs on after the drive is off): no knife missing, chipped or loose; shear bar not rounded.',
    { critical: true, classes: ['forage_harvester'] },
  ),
  item(
    'header-lock',
    'Header lift-cylinder safety lock',
    'The lock engages; never go under a raised header or pickup without it.',
    { critical: true, hazards: ['raised_load'], classes: ['forage_harvester'] },
  ),
];
