import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router-dom';
import { NotFound, RouteError } from '../components/errors/route-error';
import { lazyPage } from './lazy-page';
import { organizationPages } from './organization-pages';
import { paths } from './paths';
import { OrganizationLayout, organizationLoader } from './routes/organization-layout';
import { AppLoading, RootLayout } from './routes/root';
import { OfflineWarmUp } from './offline-warm-up';
import { OutboxSender } from './outbox-sender';

const home = paths.home.href();

export function createAppRouter(queryClient: QueryClient) {
  const page = lazyPage(queryClient);
  return createBrowserRouter([
    {
      path: paths.home.path,
      element: <RootLayout />,
      HydrateFallback: AppLoading,
      errorElement: <RouteError homeHref={home} />,
      children: [
        {
          index: true,
          lazy: page(
            () => import('./routes/home'),
            (m) => [m.HomePage, m.homeLoader],
          ),
        },
        {
          path: paths.signIn.path,
          lazy: page(
            () => import('./routes/sign-in'),
            (m) => [m.SignInPage, m.signInLoader],
          ),
        },
        {
          path: paths.forgotPassword.path,
          lazy: page(
            () => import('./routes/forgot-password'),
            (m) => [m.ForgotPasswordPage],
          ),
        },
        {
          path: paths.signUp.path,
          lazy: page(
            () => import('./routes/sign-up'),
            (m) => [m.SignUpPage, m.signUpLoader],
          ),
        },
        {
          path: paths.verifyEmail.path,
          lazy: page(
            () => import('./routes/verify-email'),
            (m) => [m.VerifyEmailPage],
          ),
        },
        {
          path: paths.confirmEmail.path,
          lazy: page(
            () => import('./routes/confirm-email'),
            (m) => [m.ConfirmEmailPage],
          ),
        },
        {
          path: paths.organizationNew.path,
          lazy: page(
            () => import('./routes/organization-new'),
            (m) => [m.OrganizationNewPage, m.organizationNewLoader],
          ),
        },
        {
          path: paths.resetPassword.path,
          lazy: page(
            () => import('./routes/reset-password'),
            (m) => [m.ResetPasswordPage],
          ),
        },
        {
          path: paths.invitation.path,
          lazy: page(
            () => import('./routes/accept-invitation'),
            (m) => [m.AcceptInvitationPage, m.acceptInvitationLoader],
          ),
        },
        {
          path: paths.dealerInvitation.path,
          lazy: page(
            () => import('./routes/dealer-invitation'),
            (m) => [m.DealerInvitationPage, m.dealerInvitationLoader],
          ),
        },
        {
          path: paths.organization.dashboard.path,
          loader: organizationLoader(queryClient),
          element: (
            // work saved on the phone goes out as soon as the app runs online
            <OutboxSender>
              <OfflineWarmUp />
              <OrganizationLayout />
            </OutboxSender>
          ),
          children: [
            {
              // errors of a page show inside the shell, so the navigation stays usable
              errorElement: <RouteError homeHref={home} inShell />,
              children: organizationPages(page, queryClient),
            },
          ],
        },
        {
          path: paths.devMail.path,
          lazy: page(
            () => import('./routes/dev-mail'),
            (m) => [m.DevMailPage],
          ),
        },
        {
          path: paths.devMail.message.path,
          lazy: page(
            () => import('./routes/dev-mail'),
            (m) => [m.DevMailPage],
          ),
        },
        { path: '*', element: <NotFound homeHref={home} /> },
      ],
    },
  ]);
}
