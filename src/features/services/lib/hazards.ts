import type { Hazard } from '../../../../shared/schemas/schedule';

// The hazards of shared/schemas/schedule.ts HAZARDS in words, for the cautions of the service form.
export const HAZARD_LABELS: Record<Hazard, string> = {
  pto: 'PTO shaft',
  hydraulic_pressure: 'Stored hydraulic pressure',
  raised_load: 'Raised implement or load',
  stored_energy: 'Springs and other stored energy',
  hot_fluid: 'Hot fluids',
  battery: 'Battery',
};

export const hazardLabel = (hazard: string) =>
  HAZARD_LABELS[hazard as Hazard] ?? hazard.replace(/_/g, ' ');

/** The line every caution ends with: the product defers to those who know the machine. */
export const SAFETY_DEFERRAL =
  "Follow the operator's manual, local regulations and qualified service practice.";
