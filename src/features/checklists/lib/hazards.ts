import { HAZARDS, type Hazard } from '../../../../shared/schemas/schedule';

export const HAZARD_LABELS: Record<Hazard, string> = {
  pto: 'PTO shaft',
  hydraulic_pressure: 'Hydraulic pressure',
  raised_load: 'Raised implement or load',
  stored_energy: 'Springs, stored energy',
  hot_fluid: 'Hot fluids',
  battery: 'Battery',
};

export const HAZARD_OPTIONS = HAZARDS.map((value) => ({ value, label: HAZARD_LABELS[value] }));
