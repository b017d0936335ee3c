import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { BookingStatus } from '../../shared/schemas/dealers';

/** One machine of a booking, with names as they were when proposed. */
export interface BookingItem {
  machineId: string;
  fleetNumber: string;
  machineName: string;
  tasks: { taskId: string; name: string }[];
  /** the farm's planned record, once the farm accepted */
  serviceRecordId: string | null;
}

/** A service date a dealer proposes to a farm; accepted, it becomes planned service records. */
export class ServiceBooking extends Model<
  InferAttributes<ServiceBooking>,
  InferCreationAttributes<ServiceBooking>
> {
  declare id: CreationOptional<string>;
  /** the farm */
  declare organizationId: string;
  declare dealerOrganizationId: string;
  declare proposedBy: string | null;
  /** the farm's local ISO date */
  declare proposedFor: string;
  declare items: BookingItem[];
  declare note: CreationOptional<string>;
  declare status: CreationOptional<BookingStatus>;
  declare responseNote: CreationOptional<string>;
  declare decidedBy: string | null;
  declare decidedAt: Date | null;
  declare serviceRecordIds: CreationOptional<string[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

ServiceBooking.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    dealerOrganizationId: { type: DataTypes.UUID, allowNull: false },
    proposedBy: { type: DataTypes.UUID, allowNull: true },
    proposedFor: { type: DataTypes.DATEONLY, allowNull: false },
    items: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'proposed' },
    responseNote: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    decidedBy: { type: DataTypes.UUID, allowNull: true },
    decidedAt: { type: DataTypes.DATE, allowNull: true },
    serviceRecordIds: {
      type: DataTypes.ARRAY(DataTypes.UUID),
      allowNull: false,
      defaultValue: [],
    },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'service_bookings' },
);
