import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { AppError } from '../../errors';
import { unsubscribe } from '../../services/unsubscribe-tokens';
import { escapeHtml } from '../../services/reminder-mail';
import { unsubscribeLinkOrganization } from '../../services/unsubscribe-link';

const tokenParams = z.object({
  token: z
    .string()
    .regex(/^[0-9a-f-]{36}\.[A-Za-z0-9_-]{20,100}$/, { error: 'Not an unsubscribe link' }),
});

const gone = () =>
  new AppError(404, 'not_found', 'This unsubscribe link is not valid (or the membership ended)');

const wantsHtml = (req: Request) => req.accepts(['json', 'html']) === 'html';

function page(res: Response, status: number, title: string, body: string) {
  res
    .status(status)
    .type('html')
    .send(
      `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(title)} · Hourstone</title></head><body style="font-family:Arial,Helvetica,sans-serif;font-size:18px;line-height:1.5;max-width:32rem;margin:2rem auto;padding:0 1rem;color:#1f2a1f;"><h1 style="font-size:1.5rem;">${escapeHtml(title)}</h1>${body}</body></html>`,
    );
}

/**
 * One-click unsubscribe (RFC 8058): mail apps POST to the link of the List-Unsubscribe header.
 * GET only asks (link scanners open links; they must not unsubscribe anyone).
 */
export function unsubscribeRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/unsubscribe/:token',
    summary: 'Asks to confirm stopping the due digest (HTML page, or JSON with Accept: json)',
    tags: ['notifications'],
    access: 'public',
    params: tokenParams,
    response: z.object({ data: z.object({ organization: z.string() }) }),
    handler: async ({ req, res, params }) => {
      const found = await unsubscribeLinkOrganization(params.token);
      if (!found) throw gone();
      const organization = found.name;
      if (!wantsHtml(req)) return { data: { organization } };
      page(
        res,
        200,
        'Stop the due digest?',
        `<p>You will no longer get the due list of <strong>${escapeHtml(organization)}</strong> by e-mail. You can turn it on again on the Reminders page.</p><form method="post"><button type="submit" style="font-size:1.1rem;padding:0.7rem 1.2rem;border-radius:8px;border:0;background:#2f4f2f;color:#fff;font-weight:bold;">Stop the digest</button></form>`,
      );
    },
  });

  route(router, {
    method: 'post',
    path: '/unsubscribe/:token',
    summary: "Turns the person's due digest off (RFC 8058 one-click unsubscribe)",
    tags: ['notifications'],
    access: 'public',
    params: tokenParams,
    response: z.object({
      data: z.object({ unsubscribed: z.boolean(), organization: z.string() }),
    }),
    handler: async ({ req, res, params }) => {
      const done = await unsubscribe(params.token);
      if (!done) throw gone();
      if (!wantsHtml(req))
        return { data: { unsubscribed: true, organization: done.organizationName } };
      page(
        res,
        200,
        'Digest stopped',
        `<p>You will no longer get the due list of <strong>${escapeHtml(done.organizationName)}</strong> by e-mail. To turn it on again, open Reminders in Hourstone.</p>`,
      );
    },
  });

  return router;
}
