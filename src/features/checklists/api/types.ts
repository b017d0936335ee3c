import type { MachineCategory } from '../../../../shared/constants';
import type { Hazard } from '../../../../shared/schemas/schedule';

export interface ChecklistItem {
  id: string;
  label: string;
  guidance: string;
  critical: boolean;
  hazards: Hazard[];
  caution: string;
}

/** A farm's own checklist of a machine category. */
export interface ChecklistTemplate {
  id: string;
  category: MachineCategory;
  name: string;
  description: string;
  items: ChecklistItem[];
  updatedAt: string;
}

export interface ChecklistTemplateList {
  data: ChecklistTemplate[];
  abilities: { edit: boolean };
}

/** The list Hourstone ships for a category: used where the farm has none, and a starting point. */
export interface BuiltInChecklist {
  category: MachineCategory;
  name: string;
  description: string;
  items: ChecklistItem[];
}
