import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';
import { lazyComponent, type lazyPage } from './lazy-page';
import { paths } from './paths';
import { dashboardLoader } from './routes/dashboard-loader';

/** The pages inside an organization's shell (/o/:orgId/…), each fetched on its first visit. */
export function organizationPages(
  page: ReturnType<typeof lazyPage>,
  queryClient: QueryClient,
): RouteObject[] {
  return [
    {
      // the start page: its loader is in the first file, so its reads start beside the session
      index: true,
      loader: dashboardLoader(queryClient),
      lazy: lazyComponent(
        () => import('./routes/dashboard'),
        (m) => m.DashboardPage,
      ),
    },
    {
      path: paths.organization.logHours.path,
      lazy: page(
        () => import('./routes/log-hours'),
        (m) => [m.LogHoursPage, m.logHoursLoader],
      ),
    },
    {
      path: paths.organization.importReadings.path,
      lazy: page(
        () => import('./routes/import-readings'),
        (m) => [m.ImportReadingsPage],
      ),
    },
    {
      path: paths.organization.machines.path,
      lazy: page(
        () => import('./routes/machines'),
        (m) => [m.MachinesPage, m.machinesLoader],
      ),
    },
    {
      path: paths.organization.machineNew.path,
      lazy: page(
        () => import('./routes/machine-new'),
        (m) => [m.MachineNewPage],
      ),
    },
    {
      path: paths.organization.importFleet.path,
      lazy: page(
        () => import('./routes/import-fleet'),
        (m) => [m.ImportFleetPage],
      ),
    },
    {
      path: paths.organization.machine.path,
      lazy: page(
        () => import('./routes/machine'),
        (m) => [m.MachinePage, m.machineLoader],
      ),
    },
    {
      path: paths.organization.serviceRecordNew.path,
      lazy: page(
        () => import('./routes/service-record-new'),
        (m) => [m.ServiceRecordNewPage, m.serviceRecordNewLoader],
      ),
    },
    {
      path: paths.organization.serviceRecord.path,
      lazy: page(
        () => import('./routes/service-record'),
        (m) => [m.ServiceRecordPage, m.serviceRecordLoader],
      ),
    },
    {
      path: paths.organization.shopWeek.path,
      lazy: page(
        () => import('./routes/shop-week'),
        (m) => [m.ShopWeekPage, m.shopWeekLoader],
      ),
    },
    {
      path: paths.organization.seasonHours.path,
      lazy: page(
        () => import('./routes/season-hours'),
        (m) => [m.SeasonHoursPage, m.seasonHoursLoader],
      ),
    },
    {
      path: paths.organization.walkaroundPick.path,
      lazy: page(
        () => import('./routes/walkaround-pick'),
        (m) => [m.WalkaroundPickPage, m.walkaroundPickLoader],
      ),
    },
    {
      path: paths.organization.walkaround.path,
      lazy: page(
        () => import('./routes/walkaround'),
        (m) => [m.WalkaroundPage, m.walkaroundLoader],
      ),
    },
    {
      path: paths.organization.defects.path,
      lazy: page(
        () => import('./routes/defects'),
        (m) => [m.DefectsPage, m.defectsLoader],
      ),
    },
    {
      path: paths.organization.machineLabel.path,
      lazy: page(
        () => import('./routes/machine-label'),
        (m) => [m.MachineLabelPage, m.machineLabelLoader],
      ),
    },
    {
      path: paths.organization.checklists.path,
      lazy: page(
        () => import('./routes/checklists'),
        (m) => [m.ChecklistsPage, m.checklistsLoader],
      ),
    },
    {
      path: paths.organization.dealerBoard.path,
      lazy: page(
        () => import('./routes/dealer-board'),
        (m) => [m.DealerBoardPage, m.dealerBoardLoader],
      ),
    },
    {
      path: paths.organization.partsForecast.path,
      lazy: page(
        () => import('./routes/parts-forecast'),
        (m) => [m.PartsForecastPage],
      ),
    },
    {
      path: paths.organization.customers.path,
      lazy: page(
        () => import('./routes/customers'),
        (m) => [m.CustomersPage, m.customersLoader],
      ),
    },
    {
      path: paths.organization.customerMachine.path,
      lazy: page(
        () => import('./routes/customer-machine'),
        (m) => [m.CustomerMachinePage, m.customerMachineLoader],
      ),
    },
    {
      path: paths.organization.customerServiceRecordNew.path,
      lazy: page(
        () => import('./routes/service-record-new'),
        (m) => [m.ServiceRecordNewPage, m.serviceRecordNewLoader],
      ),
    },
    {
      path: paths.organization.customerServiceRecord.path,
      lazy: page(
        () => import('./routes/service-record'),
        (m) => [m.ServiceRecordPage, m.serviceRecordLoader],
      ),
    },
    {
      path: paths.organization.bookings.path,
      lazy: page(
        () => import('./routes/bookings'),
        (m) => [m.BookingsPage, m.bookingsLoader],
      ),
    },
    {
      path: paths.organization.farmDealers.path,
      lazy: page(
        () => import('./routes/farm-dealers'),
        (m) => [m.FarmDealersPage, m.farmDealersLoader],
      ),
    },
    {
      path: paths.organization.team.path,
      lazy: page(
        () => import('./routes/team'),
        (m) => [m.TeamPage, m.teamLoader],
      ),
    },
    {
      path: paths.organization.account.path,
      lazy: page(
        () => import('./routes/account'),
        (m) => [m.AccountPage],
      ),
    },
    {
      path: paths.organization.settings.path,
      lazy: page(
        () => import('./routes/organization-settings'),
        (m) => [m.OrganizationSettingsPage, m.organizationSettingsLoader],
      ),
    },
    {
      path: paths.organization.reminders.path,
      lazy: page(
        () => import('./routes/notification-settings'),
        (m) => [m.NotificationSettingsPage, m.notificationSettingsLoader],
      ),
    },
    {
      path: paths.organization.messages.path,
      lazy: page(
        () => import('./routes/sent-messages'),
        (m) => [m.SentMessagesPage, m.sentMessagesLoader],
      ),
    },
    {
      path: paths.organization.message.path,
      lazy: page(
        () => import('./routes/sent-messages'),
        (m) => [m.SentMessagesPage, m.sentMessagesLoader],
      ),
    },
  ];
}
