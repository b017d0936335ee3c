import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  invitationAcceptSchema,
  passwordChangeSchema,
  passwordResetConfirmSchema,
  passwordResetRequestSchema,
  invitationLookupResponseSchema,
  mailSentResponseSchema,
  meResponseSchema,
  sessionProbeResponseSchema,
  signInSchema,
} from '../../../shared/schemas/auth';
import { presentMe } from '../../presenters/me';
import { endSession, loadSession, SESSION_COOKIE, startSession } from '../../infra/session';
import {
  acceptInvitation,
  confirmPasswordReset,
  findOpenInvitation,
  loadMemberships,
  requestPasswordReset,
} from '../../services/accounts';
import { changePassword, verifyCredentials } from '../../services/credentials';
import {
  resetPerAddress,
  resetPerEmail,
  signInAccountDelay,
  signInPerAddress,
} from '../../middlewares/rate-limit';

export function authRouter(): Router {
  const router = Router();

  route(router, {
    method: 'post',
    path: '/auth/sign-in',
    summary:
      'Sign in with e-mail and password; sets the session cookie. After repeated failures the account waits (429 with Retry-After)',
    tags: ['auth'],
    access: 'public',
    before: [signInPerAddress, signInAccountDelay],
    body: signInSchema,
    response: meResponseSchema,
    handler: async ({ req, res, body }) => {
      const user = await verifyCredentials(body.email, body.password);
      await startSession(req, res, user.id);
      return { data: presentMe(user, await loadMemberships(user.id)) };
    },
  });

  route(router, {
    method: 'post',
    path: '/auth/sign-out',
    summary: 'Sign out: ends the session on the server and clears the cookie',
    tags: ['auth'],
    access: 'public',
    status: 204,
    handler: async ({ req, res }) => {
      await endSession(req, res);
    },
  });

  route(router, {
    method: 'post',
    path: '/auth/password',
    summary: 'Change the password (the current one is required); ends every other session',
    tags: ['auth'],
    access: 'user',
    status: 204,
    body: passwordChangeSchema,
    handler: async ({ req, body }) => {
      const { user, sessionId } = req.auth!;
      await changePassword(user, sessionId, body.currentPassword, body.password);
    },
  });

  route(router, {
    method: 'get',
    path: '/me',
    summary: 'The signed-in user and their memberships',
    tags: ['auth'],
    access: 'user',
    response: meResponseSchema,
    handler: ({ req }) => ({ data: presentMe(req.auth!.user, req.auth!.memberships) }),
  });

  route(router, {
    method: 'get',
    path: '/session',
    summary:
      'Whether this browser is signed in: the user and memberships, or signedIn: false (200 either way, unlike /me)',
    tags: ['auth'],
    access: 'public',
    response: sessionProbeResponseSchema,
    handler: async ({ req }) => {
      const session = await loadSession(req.cookies?.[SESSION_COOKIE]);
      if (!session) return { data: { signedIn: false as const } };
      const me = presentMe(session.user, session.user.memberships);
      return { data: { signedIn: true as const, me } };
    },
  });

  route(router, {
    method: 'post',
    path: '/auth/password-reset',
    summary:
      'E-mail a single-use password reset link that voids older ones (answers the same, in the same time, for unknown addresses)',
    tags: ['auth'],
    access: 'public',
    before: [resetPerAddress, resetPerEmail],
    status: 202,
    body: passwordResetRequestSchema,
    response: mailSentResponseSchema,
    handler: async ({ body }) => {
      await requestPasswordReset(body.email);
      return { data: { sent: true } };
    },
  });

  route(router, {
    method: 'post',
    path: '/auth/password-reset/confirm',
    summary: 'Set a new password with a reset token; ends every session of the user, then signs in',
    tags: ['auth'],
    access: 'public',
    body: passwordResetConfirmSchema,
    response: meResponseSchema,
    handler: async ({ req, res, body }) => {
      const user = await confirmPasswordReset(body.token, body.password);
      await startSession(req, res, user.id);
      return { data: presentMe(user, await loadMemberships(user.id)) };
    },
  });

  const tokenParams = z.object({ token: z.string().min(20).max(200) });

  route(router, {
    method: 'get',
    path: '/invitations/:token',
    summary: 'Look up an open invitation by its token',
    tags: ['auth'],
    access: 'public',
    params: tokenParams,
    response: invitationLookupResponseSchema,
    handler: async ({ params }) => {
      const inv = await findOpenInvitation(params.token);
      return {
        data: {
          email: inv.email,
          name: inv.name,
          role: inv.role,
          organization: {
            id: inv.organization!.id,
            name: inv.organization!.name,
            kind: inv.organization!.kind,
          },
        },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/invitations/:token/accept',
    summary: 'Accept an invitation: set name and password, join, sign in',
    tags: ['auth'],
    access: 'public',
    params: tokenParams,
    body: invitationAcceptSchema,
    response: meResponseSchema,
    handler: async ({ req, res, params, body }) => {
      const user = await acceptInvitation(params.token, body.name, body.password);
      await startSession(req, res, user.id);
      return { data: presentMe(user, await loadMemberships(user.id)) };
    },
  });

  return router;
}
