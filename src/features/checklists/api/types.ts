// The checklist-template API's answers are the shared schemas' types (shared/schemas/walkarounds.ts).
export type {
  BuiltInChecklist,
  ChecklistItem,
  ChecklistTemplate,
  ChecklistTemplateList,
} from '../../../../shared/schemas/walkarounds';
