import { Router } from 'express';
import { caughtMailListResponseSchema } from '../../../shared/schemas/dev-mail';
import { route } from '../route';
import { AppError } from '../../errors';
import { caughtMessages, mailCatcherAvailable } from '../../infra/mail-catcher';

/** Development only: the local mail catcher's inbox, so invitation and reset links can be opened. */
export function devRouter(): Router {
  const router = Router();
  route(router, {
    method: 'get',
    path: '/dev/mail',
    summary: 'Mail caught by the local mail catcher (development and test only)',
    tags: ['dev'],
    access: 'public',
    response: caughtMailListResponseSchema,
    handler: async () => {
      if (!mailCatcherAvailable()) throw new AppError(404, 'not_found', 'No such route');
      const messages = await caughtMessages();
      return {
        data: messages.map((m) => ({
          id: String(m.id),
          from: String(m.from ?? ''),
          to: (m.to as string[]) ?? [],
          subject: String(m.subject ?? ''),
          date: String(m.date ?? ''),
          text: String(m.text ?? ''),
          html: (m.html as string) || null,
        })),
      };
    },
  });
  return router;
}
