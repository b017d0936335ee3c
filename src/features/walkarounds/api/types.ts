import type { MachineCategory, MachineStatus, MeterUnit } from '../../../../shared/constants';
import type { DefectSeverity, DefectStatus } from '../../../../shared/schemas/defects';
import type { Hazard } from '../../../../shared/schemas/schedule';
import type { WalkaroundPurpose, WalkaroundResult } from '../../../../shared/schemas/walkarounds';

export interface MachineRef {
  id: string;
  fleetNumber: string;
  name: string;
  category: MachineCategory;
  status: MachineStatus;
  meterUnit: MeterUnit;
}

export interface LastReading {
  value: number;
  /** ISO instant */
  takenAt: string;
}

export interface ChecklistItem {
  id: string;
  label: string;
  guidance: string;
  /** a fail here tags the machine out */
  critical: boolean;
  hazards: Hazard[];
  /** the server's caution text for the item's hazards (empty when it has none) */
  caution: string;
}

export interface Checklist {
  machine: MachineRef & { lastReading: LastReading | null };
  purpose: WalkaroundPurpose;
  template: { id: string | null; name: string; description: string; source: 'farm' | 'built_in' };
  items: ChecklistItem[];
  criticalNote: string;
}

export interface ChecklistResponse {
  data: Checklist;
  abilities: { editTemplate: boolean; inspect: boolean };
}

/** A machine in the walkaround picker (a row of GET machines). */
export interface PickableMachine extends MachineRef {
  lastReading: LastReading | null;
}

export interface RaisedDefect {
  id: string;
  title: string;
  description: string;
  severity: DefectSeverity;
  status: DefectStatus;
  itemId: string | null;
  reportCount: number;
}

export interface SentWalkaround {
  id: string;
  clientId: string;
  performedAt: string;
  meterValue: number;
  result: WalkaroundResult;
  taggedOut: boolean;
  counts: Record<WalkaroundResult, number>;
}

/** The answer to POST walkarounds (201 new, 200 duplicate: that clientId was already sent). */
export interface WalkaroundOutcome {
  data: SentWalkaround;
  defects: RaisedDefect[];
  machine: MachineRef;
  taggedOut: boolean;
  message: string | null;
  duplicate: boolean;
}

export interface UploadedPhoto {
  id: string;
  photoUrl: string;
  thumbnailUrl: string;
}
