import { buttonClasses } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import { Spinner } from '../../../components/ui/spinner';
import type { DraftAnswer } from '../lib/draft';

/** A photo taken but not uploaded yet: uploading now, waiting for a connection, or refused. */
export type PhotoState =
  | { status: 'uploading' }
  | { status: 'waiting'; previewUrl: string }
  | { status: 'error'; message: string };

interface ItemPhotoProps {
  itemLabel: string;
  photo: DraftAnswer['photo'];
  state: PhotoState | undefined;
  onPick: (file: File) => void;
  onRemove: () => void;
}

/**
 * The optional photo of an item: opens the camera on a phone (capture="environment") and is
 * uploaded at once. The input is named "Photo for <item>"; the visible button says "Photo".
 */
export function PhotoButton({
  itemLabel,
  state,
  onPick,
}: Omit<ItemPhotoProps, 'photo' | 'onRemove'>) {
  return (
    <label
      className={buttonClasses(
        'secondary',
        'relative min-h-12 shrink-0 cursor-pointer px-3 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-sky-600',
      )}
    >
      {state?.status === 'uploading' ? <Spinner /> : <CameraIcon />}
      <span>
        Photo<span className="sr-only"> for {itemLabel}</span>
      </span>
      <input
        type="file"
        accept="image/*"
        capture="environment"
        className="absolute inset-0 size-full cursor-pointer opacity-0"
        onChange={(event) => {
          const file = event.target.files?.[0];
          event.target.value = ''; // the same photo picked again is a new choice
          if (file) onPick(file);
        }}
      />
    </label>
  );
}

/**
 * The photo taken for an item: its thumbnail and "Remove", or where it stands. Without a
 * connection the photo waits and is tried again on sending; the screen says it may be left out.
 */
export function PhotoStatus({ itemLabel, photo, state, onRemove }: Omit<ItemPhotoProps, 'onPick'>) {
  const thumbnail = photo?.thumbnailUrl ?? (state?.status === 'waiting' ? state.previewUrl : null);
  if (!thumbnail && !state) return null;
  return (
    <div className="flex flex-col gap-2">
      {thumbnail ? (
        <div className="flex items-center gap-2">
          <img
            src={thumbnail}
            alt={`Photo for ${itemLabel}`}
            className="size-14 rounded-lg border border-field-200 object-cover"
          />
          <button
            type="button"
            onClick={onRemove}
            className="min-h-12 rounded-lg px-3 font-bold text-field-700 underline hover:bg-field-100"
          >
            Remove<span className="sr-only"> photo for {itemLabel}</span>
          </button>
        </div>
      ) : null}
      {state?.status === 'uploading' ? (
        <p className="text-sm text-field-600" role="status">
          Uploading the photo…
        </p>
      ) : state?.status === 'waiting' ? (
        <p className="flex items-start gap-1.5 text-sm font-bold text-straw-900">
          <Icon name="alert" className="mt-0.5 size-4 shrink-0" />
          <span>
            No connection: the photo is not uploaded yet. It is tried again when you send; if there
            is still no connection, the walkaround goes without it — describe what you saw in the
            note.
          </span>
        </p>
      ) : state?.status === 'error' ? (
        <p className="flex items-start gap-1.5 text-sm font-bold text-poppy-700">
          <Icon name="error" className="mt-0.5 size-4 shrink-0" />
          <span>{state.message}</span>
        </p>
      ) : null}
    </div>
  );
}

function CameraIcon() {
  return (
    <svg
      viewBox="0 0 24 24"
      aria-hidden="true"
      className="size-5"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      <path d="M4 8.5A1.5 1.5 0 0 1 5.5 7h2l1.5-2h6l1.5 2h2A1.5 1.5 0 0 1 20 8.5v9a1.5 1.5 0 0 1-1.5 1.5h-13A1.5 1.5 0 0 1 4 17.5z" />
      <circle cx="12" cy="13" r="3.5" />
    </svg>
  );
}
