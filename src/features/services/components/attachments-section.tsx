import { useId, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Icon } from '../../../components/ui/icons';
import { Spinner } from '../../../components/ui/spinner';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { useDeleteAttachment, useUploadAttachment } from '../api/upload-attachment';
import type { Attachment } from '../api/types';
import { formatBytes } from '../lib/record-format';

const ACCEPT = 'image/jpeg,image/png,image/webp,image/heic,image/heif,application/pdf';

/** Photos (thumbnails, open full size) and PDFs of a record, and the upload for those who may. */
export function AttachmentsSection({
  orgId,
  recordId,
  attachments,
  canAttach,
  timeZone,
}: {
  orgId: string;
  recordId: string;
  attachments: Attachment[];
  canAttach: boolean;
  timeZone: string;
}) {
  const images = attachments.filter((a) => a.kind === 'image');
  const pdfs = attachments.filter((a) => a.kind === 'pdf');
  const [removing, setRemoving] = useState<Attachment | null>(null);
  const remove = useDeleteAttachment(orgId, recordId);

  return (
    <div className="flex flex-col gap-4">
      {attachments.length === 0 ? (
        <p className="text-field-600">No photos or documents yet.</p>
      ) : null}
      {images.length > 0 ? (
        <ul aria-label="Photos" className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          {images.map((a) => (
            <li key={a.id} className="flex flex-col gap-1">
              <a
                href={a.url}
                target="_blank"
                rel="noreferrer"
                className="block overflow-hidden rounded-lg border border-field-200 bg-field-50"
              >
                <img
                  src={a.thumbnailUrl ?? a.url}
                  alt={`Photo ${a.fileName}`}
                  loading="lazy"
                  className="aspect-square w-full object-cover"
                />
              </a>
              <span className="truncate text-sm text-field-700" title={a.fileName}>
                {a.fileName}
              </span>
              {canAttach ? <RemoveButton name={a.fileName} onClick={() => setRemoving(a)} /> : null}
            </li>
          ))}
        </ul>
      ) : null}
      {pdfs.length > 0 ? (
        <ul aria-label="Documents" className="flex flex-col gap-2">
          {pdfs.map((a) => (
            <li
              key={a.id}
              className="flex flex-wrap items-center justify-between gap-2 rounded-lg border border-field-200 p-3"
            >
              <a
                href={a.url}
                target="_blank"
                rel="noreferrer"
                className="inline-flex min-h-touch items-center gap-2 font-bold text-field-800 underline hover:text-field-950"
              >
                <Icon name="external" />
                {a.fileName}
              </a>
              <span className="text-sm text-field-600">
                PDF, {formatBytes(a.sizeBytes)} · {formatDateTime(a.createdAt, timeZone)}
                {a.uploadedBy ? ` · ${a.uploadedBy.name}` : ''}
              </span>
              {canAttach ? <RemoveButton name={a.fileName} onClick={() => setRemoving(a)} /> : null}
            </li>
          ))}
        </ul>
      ) : null}
      {canAttach ? <UploadControl orgId={orgId} recordId={recordId} /> : null}
      <ConfirmDialog
        open={removing !== null}
        title={`Remove ${removing?.fileName ?? 'this file'}?`}
        confirmLabel="Remove file"
        pending={remove.isPending}
        error={remove.error ? remove.error.message : null}
        onCancel={() => {
          setRemoving(null);
          remove.reset();
        }}
        onConfirm={() =>
          removing && remove.mutate(removing.id, { onSuccess: () => setRemoving(null) })
        }
      >
        The file is deleted from this record for everyone.
      </ConfirmDialog>
    </div>
  );
}

function RemoveButton({ name, onClick }: { name: string; onClick: () => void }) {
  return (
    <Button
      variant="ghost"
      icon="trash"
      className="self-start"
      aria-label={`Remove ${name}`}
      onClick={onClick}
    >
      Remove
    </Button>
  );
}

/** The file picker: uploads at once; the server's refusal (type, size) shows right below it. */
function UploadControl({ orgId, recordId }: { orgId: string; recordId: string }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const upload = useUploadAttachment(orgId, recordId);
  const [done, setDone] = useState<string | null>(null);
  const error = upload.error
    ? isApiError(upload.error)
      ? (upload.error.fields.file ?? upload.error.message)
      : 'The upload failed. Try again.'
    : null;

  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="font-bold text-field-900">
        Add photo or PDF
      </label>
      <p id={`${id}-hint`} className="text-sm text-field-600">
        A photo (JPEG, PNG, WebP or HEIC) or a PDF such as an invoice or a pressure test sheet; at
        most 10 MB.
      </p>
      <input
        id={id}
        ref={input}
        type="file"
        accept={ACCEPT}
        disabled={upload.isPending}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-hint${error ? ` ${id}-error` : ''}`}
        className="min-h-touch w-full rounded-lg border border-field-300 bg-white p-2 file:mr-3 file:min-h-10 file:rounded-md file:border-0 file:bg-field-800 file:px-3 file:font-bold file:text-oat-50"
        onChange={(event) => {
          const file = event.target.files?.[0];
          if (!file) return;
          setDone(null);
          upload.mutate(file, {
            onSuccess: (attachment) => setDone(`${attachment.fileName} added.`),
            onSettled: () => {
              if (input.current) input.current.value = '';
            },
          });
        }}
      />
      <p role="status" className="text-sm text-field-700">
        {upload.isPending ? (
          <span className="inline-flex items-center gap-2">
            <Spinner /> Uploading…
          </span>
        ) : (
          (done ?? '')
        )}
      </p>
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-bold text-poppy-700">
          <Icon name="error" className="mt-0.5 size-4" />
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}
