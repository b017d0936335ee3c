import { Router } from 'express';
import { route } from '../route';
import {
  accountDeleteSchema,
  accountResponseSchema,
  accountUpdateSchema,
  emailChangedResponseSchema,
  emailChangeSchema,
  emailTokenSchema,
  signUpSchema,
  signUpStatusResponseSchema,
} from '../../../shared/schemas/account';
import { mailSentResponseSchema, meResponseSchema } from '../../../shared/schemas/auth';
import { presentMe } from '../../presenters/me';
import {
  confirmEmailChange,
  deleteAccount,
  describeAccount,
  requestEmailChange,
  updateAccount,
} from '../../services/account-settings';
import { loadMemberships } from '../../services/accounts';
import { endSession, startSession } from '../../infra/session';
import { confirmSignUp, requestSignUp } from '../../services/sign-up';
import { signUpIsOpen } from '../../services/sign-up-gate';
import {
  refuseWhenSignUpClosed,
  signUpPerAddress,
  signUpPerEmail,
} from '../../middlewares/sign-up-limit';

/** Signing up, and each person's own account settings. */
export function accountRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/auth/sign-up',
    summary: 'Whether this server lets people sign up (SIGNUP=open) or only invites them',
    tags: ['auth'],
    access: 'public',
    response: signUpStatusResponseSchema,
    handler: () => ({ data: { open: signUpIsOpen() } }),
  });

  route(router, {
    method: 'post',
    path: '/auth/sign-up',
    summary:
      'Sign up with name, e-mail and password: a single-use link to confirm the address is e-mailed (the same answer, in the same time, for an address that has an account: its owner is told instead). 403 when sign-up is closed',
    tags: ['auth'],
    access: 'public',
    before: [refuseWhenSignUpClosed, signUpPerAddress, signUpPerEmail],
    status: 202,
    body: signUpSchema,
    response: mailSentResponseSchema,
    handler: async ({ body }) => {
      await requestSignUp(body);
      return { data: { sent: true } };
    },
  });

  route(router, {
    method: 'post',
    path: '/auth/verify-email',
    summary: "Open a sign-up's confirmation link: creates the account, once, and signs in",
    tags: ['auth'],
    access: 'public',
    body: emailTokenSchema,
    response: meResponseSchema,
    handler: async ({ req, res, body }) => {
      const user = await confirmSignUp(body.token);
      await startSession(req, res, user.id);
      return { data: presentMe(user, await loadMemberships(user.id)) };
    },
  });

  route(router, {
    method: 'get',
    path: '/account',
    summary:
      'The signed-in account: name, e-mail, an address change waiting for its link, and the organizations it is the last manager of',
    tags: ['account'],
    access: 'user',
    response: accountResponseSchema,
    handler: async ({ req }) => ({ data: await describeAccount(req.auth!.user) }),
  });

  route(router, {
    method: 'patch',
    path: '/account',
    summary: "Change the account's name (only the fields sent)",
    tags: ['account'],
    access: 'user',
    body: accountUpdateSchema,
    response: accountResponseSchema,
    handler: async ({ req, body }) => {
      const user = await updateAccount(req.auth!.user, body);
      return { data: await describeAccount(user) };
    },
  });

  route(router, {
    method: 'post',
    path: '/account/email',
    summary:
      'Ask to change the e-mail address (current password required): it takes effect when the link sent to the new address is opened',
    tags: ['account'],
    access: 'user',
    status: 202,
    body: emailChangeSchema,
    response: accountResponseSchema,
    handler: async ({ req, body }) => {
      const user = req.auth!.user;
      await requestEmailChange(user, body.email, body.currentPassword);
      return { data: await describeAccount(user) };
    },
  });

  route(router, {
    method: 'post',
    path: '/account/email/confirm',
    summary: "Open an address change's link: the account signs in with the new address from now on",
    tags: ['account'],
    access: 'public',
    body: emailTokenSchema,
    response: emailChangedResponseSchema,
    handler: async ({ body }) => {
      const user = await confirmEmailChange(body.token);
      return { data: { email: user.email } };
    },
  });

  route(router, {
    method: 'delete',
    path: '/account',
    summary:
      'Delete the account (current password required); 409 while it is the last manager of an organization, naming it',
    tags: ['account'],
    access: 'user',
    status: 204,
    body: accountDeleteSchema,
    handler: async ({ req, res, body }) => {
      await deleteAccount(req.auth!.user, body.currentPassword);
      await endSession(req, res);
    },
  });

  return router;
}
