// The local mail catcher's HTTP API (development and tests): the messages it has caught.
import { env } from '../env';
import { AppError } from '../errors';

/** Whether a mail catcher is there to read: never in production. */
export const mailCatcherAvailable = () =>
  env.NODE_ENV !== 'production' && Boolean(env.MAIL_CATCHER_URL);

/** Every caught message as the catcher lists it; 502 when it does not answer. */
export async function caughtMessages(): Promise<Array<Record<string, unknown>>> {
  const response = await fetch(`${env.MAIL_CATCHER_URL}/messages`);
  if (!response.ok)
    throw new AppError(502, 'mail_catcher', 'The local mail catcher did not answer');
  return (await response.json()) as Array<Record<string, unknown>>;
}
