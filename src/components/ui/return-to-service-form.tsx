import { returnToServiceSchema } from '../../../shared/schemas/defects';
import { NoteForm } from './note-form';

/**
 * The one form of the "return to service" step, wherever it is offered (the machine page, the
 * defects page, a service record): the note of what was checked, and a caution. The caller's
 * mutation does the request, so each feature keeps its own API call.
 */
export function ReturnToServiceForm({
  fleetNumber,
  onSubmit,
  onCancel,
}: {
  fleetNumber: string;
  onSubmit: (note: string) => Promise<unknown>;
  onCancel?: () => void;
}) {
  return (
    <NoteForm
      schema={returnToServiceSchema}
      field="note"
      multiline
      label="What was checked before returning it to service"
      hint="Required, and kept with the machine's history. Check the repair and the machine as the operator's manual, local regulations and qualified service practice require before anyone uses it."
      formLabel={`Return ${fleetNumber} to service`}
      submitLabel={`Return ${fleetNumber} to service`}
      onSubmit={onSubmit}
      onCancel={onCancel}
    />
  );
}
