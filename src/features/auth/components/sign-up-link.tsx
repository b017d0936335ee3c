import { Link } from 'react-router-dom';
import { useSignUpStatus } from '../api/sign-up';

/** "New here? Create an account" — only where this server takes sign-ups. */
export function SignUpLink({ href }: { href: string }) {
  const status = useSignUpStatus();
  if (!status.data?.open) return null;
  return (
    <p>
      New to Hourstone?{' '}
      <Link
        to={href}
        className="inline-flex min-h-touch items-center font-bold underline underline-offset-4"
      >
        Create an account
      </Link>
    </p>
  );
}
