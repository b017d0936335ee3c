import { useId } from 'react';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-client';
import { useRemoveMachinePhoto, useUploadMachinePhoto } from '../api/machine-photo';

/** The machine's photo (served by the API to people who may see it); a manager uploads or removes it. */
export function MachinePhoto({
  orgId,
  machine,
  canEdit,
}: {
  orgId: string;
  machine: {
    id: string;
    fleetNumber: string;
    photoUrl: string | null;
    thumbnailUrl: string | null;
  };
  canEdit: boolean;
}) {
  const inputId = useId();
  const upload = useUploadMachinePhoto(orgId, machine.id);
  const remove = useRemoveMachinePhoto(orgId, machine.id);
  const error = upload.error ?? remove.error;
  const message = error
    ? isApiError(error)
      ? (error.fields?.photo ?? error.message)
      : 'The photo could not be saved. Try again.'
    : null;
  if (!machine.photoUrl && !canEdit) return null;
  return (
    <div className="flex flex-col gap-2">
      {machine.photoUrl ? (
        <a href={machine.photoUrl} target="_blank" rel="noreferrer" className="w-fit">
          <img
            src={machine.thumbnailUrl ?? machine.photoUrl}
            alt={`Photo of ${machine.fleetNumber}`}
            className="size-40 rounded-lg border border-field-200 object-cover"
          />
        </a>
      ) : null}
      {canEdit ? (
        <div className="flex flex-col gap-1.5">
          <label htmlFor={inputId} className="font-bold text-field-900">
            {machine.photoUrl ? 'Replace photo' : 'Add a photo'}
          </label>
          <input
            id={inputId}
            type="file"
            accept="image/jpeg,image/png,image/webp,image/heic"
            aria-describedby={message ? `${inputId}-error` : undefined}
            aria-invalid={message ? true : undefined}
            disabled={upload.isPending}
            onChange={(event) => {
              const file = event.target.files?.[0];
              if (file) upload.mutate(file);
              event.target.value = '';
            }}
            className="min-h-touch text-field-900 file:mr-3 file:min-h-touch file:rounded-lg file:border-0 file:bg-field-800 file:px-4 file:font-bold file:text-oat-50"
          />
          <p className="text-sm text-field-600">JPEG, PNG, WebP or HEIC, at most 10 MB.</p>
          {message ? (
            <p id={`${inputId}-error`} className="text-sm font-bold text-poppy-700">
              {message}
            </p>
          ) : null}
          {machine.photoUrl ? (
            <Button variant="ghost" icon="close" className="w-fit" onClick={() => remove.mutate()}>
              Remove photo
            </Button>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
