import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-client';

interface ConfirmLinkButtonProps {
  label: string;
  pending: boolean;
  error: unknown;
  onConfirm: () => void;
  /** where a person whose link no longer works can go on */
  recovery: { href: string; label: string };
}

/**
 * The one step of an e-mailed link: a button, not an action on load, so a mail scanner that
 * opens links ahead of the person uses nothing up.
 */
export function ConfirmLinkButton({
  label,
  pending,
  error,
  onConfirm,
  recovery,
}: ConfirmLinkButtonProps) {
  const message = error
    ? isApiError(error)
      ? (error.fields.token ?? error.message)
      : 'Something went wrong. Try again.'
    : null;
  return (
    <div className="flex flex-col gap-4">
      {message ? (
        <Alert title="This link no longer works">
          <p>{message}</p>
          <Link
            to={recovery.href}
            className="mt-1 inline-flex min-h-touch items-center font-bold underline underline-offset-4"
          >
            {recovery.label}
          </Link>
        </Alert>
      ) : null}
      <Button pending={pending} className="w-full" onClick={onConfirm}>
        {label}
      </Button>
    </div>
  );
}
