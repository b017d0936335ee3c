// The one table of hazards: for each kind a task or checklist item can carry (HAZARDS), its label
// and its caution — what to do about it. The client's caution component, the checklist and task
// editors, the built-in walkaround checklists and the server's e-mails all read their words here.
// The texts are common safety practice, written for this product; they are not the wording of a
// standard or of any manual, and each ends by deferring to the operator's manual, local
// regulations and qualified service practice (SAFETY_DEFERRAL).
import { HAZARD_LABELS, SAFETY_DEFERRAL, hazardLabel } from '../constants';
import type { Hazard } from '../schemas/schedule';

export interface HazardEntry {
  /** the hazard in words: "PTO shaft" (shared/constants HAZARD_LABELS) */
  label: string;
  /** what to do, without the deferral: "Stop the engine, take the key…" */
  advice: string;
  /** the advice followed by the deferral: the caution of this hazard alone */
  caution: string;
}

const ADVICE: Record<Hazard, string> = {
  pto:
    'Stop the engine, take the key and wait for the shaft to stop before you go near the PTO, ' +
    'couple or uncouple a shaft or clear a blockage: a 540 rpm shaft turns 9 times a second, ' +
    'faster than anyone can pull free. Never step over a turning shaft; keep its guards in ' +
    'place and loose clothing and hair away.',
  hydraulic_pressure:
    'Lower everything to the ground, stop the engine and relieve the pressure before opening a ' +
    'line, fitting or filter. Search for leaks with a piece of cardboard, never your hands: oil ' +
    'under pressure can pierce the skin, and that needs a doctor at once.',
  raised_load:
    'Lower raised implements, loaders, headers and bodies to the ground, or block them on their ' +
    'mechanical lock or on stands, before you go near or under them; never trust the hydraulics ' +
    'or a jack alone. Set the parking brake and chock the wheels.',
  stored_energy:
    'Springs under snap rings, belts and chains under tension and accumulators keep their force ' +
    'after the engine stops. Release or compress them only as the manual describes, with a press ' +
    'or the proper tool, and wear eye protection.',
  hot_fluid:
    'Drain oil warm, not hot: stop the engine and let it stand until the oil is warm, not hot, so ' +
    'it still flows but cannot scald; wear gloves and eye protection and keep out of the stream. ' +
    'Open a radiator or coolant cap, or drain coolant, only once the system is cold.',
  battery:
    'Wear eye protection and keep sparks and flames away: a battery gives off explosive gas. ' +
    'Disconnect the negative terminal first and reconnect it last; rinse acid off skin or eyes ' +
    'with plenty of water.',
  chemicals:
    "Read the product's label and safety data sheet first and wear the gloves, eye protection " +
    'and respirator it names. Rinse and drain tanks, lines and nozzles before working on them; ' +
    'keep containers closed and away from food and water.',
  tyres_rims:
    'Let all the air out (valve core removed) before taking a tyre off its rim or a rim apart. ' +
    'Inflate only in a cage or with a clip-on chuck and a long hose, standing clear of the rim; ' +
    'never weld or heat a rim with a tyre on it. Support the machine on stands before removing ' +
    'a wheel.',
  power_lines:
    'Look up before raising a loader, boom, auger or body, and before moving with one raised: ' +
    'keep well clear of overhead power lines. If the machine touches a line, stay on board and ' +
    'have the power cut; if fire forces you off, jump clear with feet together and never touch ' +
    'machine and ground at once.',
  hitching_crush:
    'Never stand between tractor and implement while the tractor moves or the linkage rises or ' +
    'falls. Stop the tractor, set the parking brake and take the key before stepping in to fit ' +
    'pins, drawbar or hoses; work the outside linkage controls from beside the tractor, not ' +
    'between.',
};

/** Each hazard's label, advice and caution (advice + the deferral), keyed by its stored value. */
export const HAZARD_TABLE: Record<Hazard, HazardEntry> = Object.fromEntries(
  (Object.keys(ADVICE) as Hazard[]).map((hazard) => [
    hazard,
    {
      label: HAZARD_LABELS[hazard],
      advice: ADVICE[hazard],
      caution: `${ADVICE[hazard]} ${SAFETY_DEFERRAL}`,
    },
  ]),
) as Record<Hazard, HazardEntry>;

/** What to do about one hazard, without the deferral; '' for a value this code does not know. */
export const hazardAdvice = (hazard: string): string =>
  (HAZARD_TABLE as Record<string, HazardEntry | undefined>)[hazard]?.advice ?? '';

/** Each hazard's label and advice, in the order given; an unknown value keeps its words, no advice. */
export function hazardCautionEntries(
  hazards: readonly string[],
): { hazard: string; label: string; advice: string }[] {
  return hazards.map((hazard) => ({
    hazard,
    label: hazardLabel(hazard),
    advice: hazardAdvice(hazard),
  }));
}

/** One line per hazard, in the order given: "PTO shaft: Stop the engine, …". */
export function hazardCautionLines(hazards: readonly string[]): string[] {
  return hazardCautionEntries(hazards).map(({ label, advice }) =>
    advice ? `${label}: ${advice}` : `${label}.`,
  );
}

/** "PTO shaft, hot fluids and battery": the hazards' labels inside a sentence (abbreviations kept). */
export function hazardSentence(hazards: readonly string[]): string {
  // mid-sentence: lower-case the first letter, but keep abbreviations such as PTO
  const names = hazards
    .map(hazardLabel)
    .map((n) => (/^[A-Z]{2}/.test(n) ? n : n[0].toLowerCase() + n.slice(1)));
  return names.length > 1
    ? `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`
    : (names[0] ?? '');
}

/**
 * The whole caution of a set of hazards as one paragraph: each hazard's line, then the deferral
 * once. '' when there are none.
 */
export function hazardCautionText(hazards: readonly string[]): string {
  if (hazards.length === 0) return '';
  return [...hazardCautionLines(hazards), SAFETY_DEFERRAL].join(' ');
}
