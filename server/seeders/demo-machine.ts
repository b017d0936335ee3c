// The shape of a demo machine, shared by the two farms' fleets and the readings generator.
import type { MachineCategory, MeterUnit } from '../../shared/constants';
import type { MachineClass } from '../../shared/domain/service-library';
import type { SeasonProfile } from './readings-generator';

export interface DemoMachine {
  organization: 'larkspur' | 'osier';
  fleetNumber: string;
  name: string;
  category: MachineCategory;
  /** the service library's class the machine is set to */
  machineClass: MachineClass;
  make: string;
  model: string;
  serialNumber: string;
  year: number;
  listPrice: number;
  purchasePrice: number;
  meterUnit: MeterUnit;
  /** lifetime meter value about now (the end of the generated history), meter units */
  aboutNow: number;
  /** typical use a year, meter units */
  perYear: number;
  season: SeasonProfile;
  /** days between readings in season, when not the usual 1–3 */
  inSeasonEvery?: [number, number];
  /** e-mails of the operators assigned to it */
  operators?: string[];
}

/** Months of a season used all year round (no off season). */
export const ALL_YEAR: number[] = [];
