import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import { numericColumn } from './columns';
import type {
  OtherCost,
  ReassemblySetting,
  ServiceFluid,
  ServicePart,
  ServiceStatus,
} from '../../shared/schemas/service-records';

/** A task a record covers, with its name as it was (tasks may be renamed or removed later). */
export interface RecordTask {
  taskId: string;
  name: string;
}

export class ServiceRecord extends Model<
  InferAttributes<ServiceRecord>,
  InferCreationAttributes<ServiceRecord>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  declare status: ServiceStatus;
  /** local ISO date */
  declare plannedFor: string | null;
  /** local ISO date */
  declare performedOn: string | null;
  /** value shown on the meter fitted at the time */
  declare meterValue: number | null;
  /** the same on the machine's lifetime scale (what task due points use) */
  declare meterLifetime: number | null;
  declare readingId: string | null;
  declare tasks: CreationOptional<RecordTask[]>;
  declare technicianIds: CreationOptional<string[]>;
  declare labourHours: number | null;
  declare parts: CreationOptional<ServicePart[]>;
  declare fluids: CreationOptional<ServiceFluid[]>;
  declare otherCosts: CreationOptional<OtherCost[]>;
  declare notes: CreationOptional<string>;
  declare reassemblySettings: CreationOptional<ReassemblySetting[]>;
  declare unrestoredReason: CreationOptional<string>;
  /** defects this visit is to fix (closed when it completes) */
  declare defectIds: CreationOptional<string[]>;
  declare createdBy: string | null;
  declare completedBy: string | null;
  declare completedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

ServiceRecord.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    status: { type: DataTypes.TEXT, allowNull: false },
    plannedFor: { type: DataTypes.DATEONLY, allowNull: true },
    performedOn: { type: DataTypes.DATEONLY, allowNull: true },
    meterValue: numericColumn('meterValue', 14, 2, true),
    meterLifetime: numericColumn('meterLifetime', 14, 2, true),
    readingId: { type: DataTypes.UUID, allowNull: true },
    tasks: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    technicianIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    labourHours: numericColumn('labourHours', 8, 2, true),
    parts: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    fluids: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    otherCosts: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    reassemblySettings: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    unrestoredReason: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    defectIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    completedBy: { type: DataTypes.UUID, allowNull: true },
    completedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'service_records' },
);

/** One measurement taken during a visit; a table of its own so a machine's series is one query. */
export class ServiceMeasurement extends Model<
  InferAttributes<ServiceMeasurement>,
  InferCreationAttributes<ServiceMeasurement>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  declare serviceRecordId: string;
  declare position: number;
  declare name: string;
  declare value: number;
  declare unit: CreationOptional<string>;
  declare specMin: number | null;
  declare specMax: number | null;
  declare createdAt: CreationOptional<Date>;
}

ServiceMeasurement.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    serviceRecordId: { type: DataTypes.UUID, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    name: { type: DataTypes.TEXT, allowNull: false },
    value: numericColumn('value', 16, 4, false),
    unit: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    specMin: numericColumn('specMin', 16, 4, true),
    specMax: numericColumn('specMax', 16, 4, true),
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'service_measurements', updatedAt: false },
);

export class ServiceAttachment extends Model<
  InferAttributes<ServiceAttachment>,
  InferCreationAttributes<ServiceAttachment>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  declare serviceRecordId: string;
  declare kind: 'image' | 'pdf';
  declare contentType: string;
  declare fileName: string;
  declare sizeBytes: number;
  /** object-store key without suffix: images are `${key}.webp` and `${key}-thumb.webp`, PDFs `${key}.pdf` */
  declare objectKey: string;
  declare uploadedBy: string | null;
  declare createdAt: CreationOptional<Date>;
}

ServiceAttachment.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    serviceRecordId: { type: DataTypes.UUID, allowNull: false },
    kind: { type: DataTypes.TEXT, allowNull: false },
    contentType: { type: DataTypes.TEXT, allowNull: false },
    fileName: { type: DataTypes.TEXT, allowNull: false },
    sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
    objectKey: { type: DataTypes.TEXT, allowNull: false },
    uploadedBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'service_attachments', updatedAt: false },
);
