// Loads every model and declares the associations in one place.
import { Organization } from './organization';
import { User } from './user';
import { Membership } from './membership';
import { Invitation } from './invitation';
import { PasswordReset } from './password-reset';
import { Session } from './session';
import { EmailVerification } from './email-verification';
import { Notification } from './notification';
import { NotificationPreference } from './notification-preference';
import { CalendarFeed } from './calendar-feed';
import { AuditEvent } from './audit-event';
import { Machine, MachineOperator } from './machine';
import { MachineSpecSheet } from './machine-spec-sheet';
import { MachineMeter } from './machine-meter';
import { MeterReading, MeterReplacement } from './meter-reading';
import { ServiceTask } from './service-task';
import { ScheduleTemplate } from './schedule-template';
import { MachineForecast, TaskDuePoint } from './machine-forecast';
import { ServiceAttachment, ServiceMeasurement, ServiceRecord } from './service-record';
import { ChecklistTemplate, Walkaround, WalkaroundPhoto } from './walkaround';
import { Defect } from './defect';
import { DealerLink } from './dealer-link';
import { ServiceBooking } from './service-booking';

Membership.belongsTo(Organization, { foreignKey: 'organizationId', as: 'organization' });
Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
Session.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Invitation.belongsTo(Organization, { foreignKey: 'organizationId', as: 'organization' });
Machine.hasMany(ServiceTask, { foreignKey: 'machineId', as: 'tasks' });
Machine.hasMany(MachineOperator, { foreignKey: 'machineId', as: 'operators' });
Machine.hasMany(MachineMeter, { foreignKey: 'machineId', as: 'meters' });
MachineForecast.belongsTo(MachineMeter, { foreignKey: 'meterId', as: 'meter' });
MachineMeter.belongsTo(Machine, { foreignKey: 'machineId', as: 'machine' });
ServiceTask.belongsTo(Machine, { foreignKey: 'machineId', as: 'machine' });
ServiceTask.hasOne(TaskDuePoint, { foreignKey: 'taskId', as: 'duePoint' });
DealerLink.belongsTo(Organization, { foreignKey: 'dealerOrganizationId', as: 'dealer' });
DealerLink.belongsTo(Organization, { foreignKey: 'farmOrganizationId', as: 'farm' });

export {
  Organization,
  User,
  Membership,
  Invitation,
  PasswordReset,
  Session,
  EmailVerification,
  Notification,
  NotificationPreference,
  CalendarFeed,
  AuditEvent,
  Machine,
  MachineOperator,
  MachineSpecSheet,
  MachineMeter,
  MeterReading,
  MeterReplacement,
  ServiceTask,
  ScheduleTemplate,
  MachineForecast,
  TaskDuePoint,
  ServiceRecord,
  ServiceMeasurement,
  ServiceAttachment,
  ChecklistTemplate,
  Walkaround,
  WalkaroundPhoto,
  Defect,
  DealerLink,
  ServiceBooking,
};
