// Whether this server takes sign-ups. Apart from sign-up.ts so the sign-up rate limits (a
// middleware) read it without importing the mailer.
import { env } from '../env';
import { AppError } from '../errors';

export const signUpIsOpen = () => env.SIGNUP === 'open';

export const signUpClosed = () =>
  new AppError(
    403,
    'sign_up_closed',
    'Sign-up is closed on this server. Ask a manager of your farm or dealer for an invitation.',
  );
