import { FLUID_UNITS } from '../../../../shared/schemas/schedule';

export type FluidUnit = (typeof FLUID_UNITS)[number];
export const FLUID_UNIT_OPTIONS = FLUID_UNITS.map((value) => ({ value, label: value }));
