import { useEffect, useId, useRef, type ReactNode } from 'react';

interface FormDialogProps {
  open: boolean;
  title: string;
  onClose: () => void;
  children: ReactNode;
}

/**
 * A modal for a short form (a reminder, a booking). Built on <dialog>.showModal(), which traps
 * focus and closes on Escape; not rendered while closed.
 */
export function FormDialog({ open, title, onClose, children }: FormDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (open && dialog && !dialog.open) dialog.showModal();
  }, [open]);
  if (!open) return null;
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={onClose}
      className="m-auto max-h-[calc(100dvh-2rem)] w-[min(40rem,calc(100vw-1.5rem))] overflow-y-auto rounded-xl border border-field-200 bg-white p-0 text-field-900 shadow-xl backdrop:bg-field-950/50"
    >
      <div className="flex flex-col gap-4 p-4 sm:p-5">
        <h2 id={titleId} className="text-lg font-black">
          {title}
        </h2>
        {children}
      </div>
    </dialog>
  );
}
