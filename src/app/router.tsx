import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router-dom';
import { NotFound, RouteError } from '../components/errors/route-error';
import { paths } from './paths';
import { AcceptInvitationPage, acceptInvitationLoader } from './routes/accept-invitation';
import { AccountPage } from './routes/account';
import { DashboardPage, dashboardLoader } from './routes/dashboard';
import { DevMailPage } from './routes/dev-mail';
import { ForgotPasswordPage } from './routes/forgot-password';
import { HomePage, homeLoader } from './routes/home';
import { ImportReadingsPage } from './routes/import-readings';
import { LogHoursPage, logHoursLoader } from './routes/log-hours';
import { OrganizationLayout, organizationLoader } from './routes/organization-layout';
import { ResetPasswordPage } from './routes/reset-password';
import { AppLoading, RootLayout } from './routes/root';
import { SignInPage, signInLoader } from './routes/sign-in';
import { SignUpPage, signUpLoader } from './routes/sign-up';
import { VerifyEmailPage } from './routes/verify-email';
import { ConfirmEmailPage } from './routes/confirm-email';
import { OrganizationNewPage, organizationNewLoader } from './routes/organization-new';
import {
  OrganizationSettingsPage,
  organizationSettingsLoader,
} from './routes/organization-settings';
import { TeamPage, teamLoader } from './routes/team';
import {
  NotificationSettingsPage,
  notificationSettingsLoader,
} from './routes/notification-settings';
import { SentMessagesPage, sentMessagesLoader } from './routes/sent-messages';
import { MachinePage, machineLoader } from './routes/machine';
import { MachineNewPage } from './routes/machine-new';
import { ImportFleetPage } from './routes/import-fleet';
import { MachinesPage, machinesLoader } from './routes/machines';
import { ServiceRecordPage, serviceRecordLoader } from './routes/service-record';
import { ServiceRecordNewPage, serviceRecordNewLoader } from './routes/service-record-new';
import { ShopWeekPage, shopWeekLoader } from './routes/shop-week';
import { WalkaroundPickPage, walkaroundPickLoader } from './routes/walkaround-pick';
import { WalkaroundPage, walkaroundLoader } from './routes/walkaround';
import { DefectsPage, defectsLoader } from './routes/defects';
import { MachineLabelPage, machineLabelLoader } from './routes/machine-label';
import { ChecklistsPage, checklistsLoader } from './routes/checklists';
import { DealerBoardPage, dealerBoardLoader } from './routes/dealer-board';
import { PartsForecastPage } from './routes/parts-forecast';
import { CustomersPage, customersLoader } from './routes/customers';
import { BookingsPage, bookingsLoader } from './routes/bookings';
import { FarmDealersPage, farmDealersLoader } from './routes/farm-dealers';
import { CustomerMachinePage, customerMachineLoader } from './routes/customer-machine';
import { DealerInvitationPage, dealerInvitationLoader } from './routes/dealer-invitation';
import { WalkaroundOutboxSender } from '../features/walkarounds/components/outbox-sender';

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
        { path: paths.signUp.path, loader: signUpLoader(queryClient), element: <SignUpPage /> },
        { path: paths.verifyEmail.path, element: <VerifyEmailPage /> },
        { path: paths.confirmEmail.path, element: <ConfirmEmailPage /> },
        {
          path: paths.organizationNew.path,
          loader: organizationNewLoader(queryClient),
          element: <OrganizationNewPage />,
        },
        { path: paths.resetPassword.path, element: <ResetPasswordPage /> },
        {
          path: paths.invitation.path,
          loader: acceptInvitationLoader(queryClient),
          element: <AcceptInvitationPage />,
        },
        {
          path: paths.dealerInvitation.path,
          loader: dealerInvitationLoader(queryClient),
          element: <DealerInvitationPage />,
        },
        {
          path: paths.organization.dashboard.path,
          loader: organizationLoader(queryClient),
          element: (
            <>
              {/* walkarounds saved on the phone go out as soon as the app runs online */}
              <WalkaroundOutboxSender />
              <OrganizationLayout />
            </>
          ),
          children: [
            {
              // errors of a page show inside the shell, so the navigation stays usable
              errorElement: <RouteError homeHref={home} inShell />,
              children: [
                { index: true, loader: dashboardLoader(queryClient), element: <DashboardPage /> },
                {
                  path: paths.organization.logHours.path,
                  loader: logHoursLoader(queryClient),
                  element: <LogHoursPage />,
                },
                { path: paths.organization.importReadings.path, element: <ImportReadingsPage /> },
                {
                  path: paths.organization.machines.path,
                  loader: machinesLoader(queryClient),
                  element: <MachinesPage />,
                },
                { path: paths.organization.machineNew.path, element: <MachineNewPage /> },
                { path: paths.organization.importFleet.path, element: <ImportFleetPage /> },
                {
                  path: paths.organization.machine.path,
                  loader: machineLoader(queryClient),
                  element: <MachinePage />,
                },
                {
                  path: paths.organization.serviceRecordNew.path,
                  loader: serviceRecordNewLoader(queryClient),
                  element: <ServiceRecordNewPage />,
                },
                {
                  path: paths.organization.serviceRecord.path,
                  loader: serviceRecordLoader(queryClient),
                  element: <ServiceRecordPage />,
                },
                {
                  path: paths.organization.shopWeek.path,
                  loader: shopWeekLoader(queryClient),
                  element: <ShopWeekPage />,
                },
                {
                  path: paths.organization.walkaroundPick.path,
                  loader: walkaroundPickLoader(queryClient),
                  element: <WalkaroundPickPage />,
                },
                {
                  path: paths.organization.walkaround.path,
                  loader: walkaroundLoader(queryClient),
                  element: <WalkaroundPage />,
                },
                {
                  path: paths.organization.defects.path,
                  loader: defectsLoader(queryClient),
                  element: <DefectsPage />,
                },
                {
                  path: paths.organization.machineLabel.path,
                  loader: machineLabelLoader(queryClient),
                  element: <MachineLabelPage />,
                },
                {
                  path: paths.organization.checklists.path,
                  loader: checklistsLoader(queryClient),
                  element: <ChecklistsPage />,
                },
                {
                  path: paths.organization.dealerBoard.path,
                  loader: dealerBoardLoader(queryClient),
                  element: <DealerBoardPage />,
                },
                { path: paths.organization.partsForecast.path, element: <PartsForecastPage /> },
                {
                  path: paths.organization.customers.path,
                  loader: customersLoader(queryClient),
                  element: <CustomersPage />,
                },
                {
                  path: paths.organization.customerMachine.path,
                  loader: customerMachineLoader(queryClient),
                  element: <CustomerMachinePage />,
                },
                {
                  path: paths.organization.customerServiceRecordNew.path,
                  loader: serviceRecordNewLoader(queryClient),
                  element: <ServiceRecordNewPage />,
                },
                {
                  path: paths.organization.customerServiceRecord.path,
                  loader: serviceRecordLoader(queryClient),
                  element: <ServiceRecordPage />,
                },
                {
                  path: paths.organization.bookings.path,
                  loader: bookingsLoader(queryClient),
                  element: <BookingsPage />,
                },
                {
                  path: paths.organization.farmDealers.path,
                  loader: farmDealersLoader(queryClient),
                  element: <FarmDealersPage />,
                },
                {
                  path: paths.organization.team.path,
                  loader: teamLoader(queryClient),
                  element: <TeamPage />,
                },
                { path: paths.organization.account.path, element: <AccountPage /> },
                {
                  path: paths.organization.settings.path,
                  loader: organizationSettingsLoader(queryClient),
                  element: <OrganizationSettingsPage />,
                },
                {
                  path: paths.organization.reminders.path,
                  loader: notificationSettingsLoader(queryClient),
                  element: <NotificationSettingsPage />,
                },
                {
                  path: paths.organization.messages.path,
                  loader: sentMessagesLoader(queryClient),
                  element: <SentMessagesPage />,
                },
                {
                  path: paths.organization.message.path,
                  loader: sentMessagesLoader(queryClient),
                  element: <SentMessagesPage />,
                },
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
