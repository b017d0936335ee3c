import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router-dom';
import { NotFound, RouteError } from '../components/errors/route-error';
import { paths } from './paths';
import { AcceptInvitationPage, acceptInvitationLoader } from './routes/accept-invitation';
import { AccountPage } from './routes/account';
import { DashboardPage } from './routes/dashboard';
import { DevMailPage } from './routes/dev-mail';
import { ForgotPasswordPage } from './routes/forgot-password';
import { HomePage, homeLoader } from './routes/home';
import { OrganizationLayout, organizationLoader } from './routes/organization-layout';
import { ResetPasswordPage } from './routes/reset-password';
import { AppLoading, RootLayout } from './routes/root';
import { SignInPage, signInLoader } from './routes/sign-in';
import { TeamPage, teamLoader } from './routes/team';

const home = paths.home.href();

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      path: paths.home.path,
      element: <RootLayout />,
      HydrateFallback: AppLoading,
      errorElement: <RouteError homeHref={home} />,
      children: [
        { index: true, loader: homeLoader(queryClient), element: <HomePage /> },
        { path: paths.signIn.path, loader: signInLoader(queryClient), element: <SignInPage /> },
        { path: paths.forgotPassword.path, element: <ForgotPasswordPage /> },
        { path: paths.resetPassword.path, element: <ResetPasswordPage /> },
        {
          path: paths.invitation.path,
          loader: acceptInvitationLoader(queryClient),
          element: <AcceptInvitationPage />,
        },
        {
          path: paths.organization.dashboard.path,
          loader: organizationLoader(queryClient),
          element: <OrganizationLayout />,
          children: [
            {
              // errors of a page show inside the shell, so the navigation stays usable
              errorElement: <RouteError homeHref={home} inShell />,
              children: [
                { index: true, element: <DashboardPage /> },
                {
                  path: paths.organization.team.path,
                  loader: teamLoader(queryClient),
                  element: <TeamPage />,
                },
                { path: paths.organization.account.path, element: <AccountPage /> },
              ],
            },
          ],
        },
        { path: paths.devMail.path, element: <DevMailPage /> },
        { path: paths.devMail.message.path, element: <DevMailPage /> },
        { path: '*', element: <NotFound homeHref={home} /> },
      ],
    },
  ]);
}
