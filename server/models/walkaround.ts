import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import { numericColumn } from './columns';
import type { MachineCategory } from '../../shared/constants';
import type { Hazard } from '../../shared/schemas/schedule';
import type { CareSignedOff } from '../../shared/schemas/daily-care';
import type {
  ChecklistPhase,
  WalkaroundPurpose,
  WalkaroundResult,
} from '../../shared/schemas/walkarounds';
import type { MachineClass } from '../../shared/domain/service-library/classes';

export interface ChecklistItem {
  id: string;
  label: string;
  guidance: string;
  critical: boolean;
  hazards: Hazard[];
  caution: string;
  /** items stored before phases (JSONB, no migration) have none: read as before_start */
  phase?: ChecklistPhase;
  /** only on machines of these classes; none or empty: every machine of the category */
  classes?: MachineClass[];
}

export class ChecklistTemplate extends Model<
  InferAttributes<ChecklistTemplate>,
  InferCreationAttributes<ChecklistTemplate>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare category: MachineCategory;
  declare name: string;
  declare description: CreationOptional<string>;
  declare items: ChecklistItem[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

ChecklistTemplate.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    category: { type: DataTypes.TEXT, allowNull: false },
    name: { type: DataTypes.TEXT, allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    items: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'checklist_templates' },
);

/** One answered item, copied with its label so history survives template edits. */
export interface WalkaroundItem {
  itemId: string;
  label: string;
  critical: boolean;
  result: WalkaroundResult;
  note: string;
  photoId: string | null;
}

export class Walkaround extends Model<
  InferAttributes<Walkaround>,
  InferCreationAttributes<Walkaround>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  declare operatorId: string | null;
  declare clientId: string;
  declare purpose: WalkaroundPurpose;
  declare performedAt: Date;
  declare meterValue: number;
  declare readingId: string | null;
  declare templateId: string | null;
  declare templateName: CreationOptional<string>;
  declare items: WalkaroundItem[];
  declare result: WalkaroundResult;
  declare taggedOut: CreationOptional<boolean>;
  declare notes: CreationOptional<string>;
  /** daily care signed off with it (task, name, whether it was reset), kept with the walkaround */
  declare careDone: CreationOptional<CareSignedOff[]>;
  declare createdAt: CreationOptional<Date>;
}

Walkaround.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    operatorId: { type: DataTypes.UUID, allowNull: true },
    clientId: { type: DataTypes.UUID, allowNull: false },
    purpose: { type: DataTypes.TEXT, allowNull: false },
    performedAt: { type: DataTypes.DATE, allowNull: false },
    meterValue: numericColumn('meterValue', 14, 2, false),
    readingId: { type: DataTypes.UUID, allowNull: true },
    templateId: { type: DataTypes.UUID, allowNull: true },
    templateName: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    items: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    result: { type: DataTypes.TEXT, allowNull: false },
    taggedOut: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    careDone: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'walkarounds', updatedAt: false },
);

/** A photo uploaded ahead of its walkaround (the phone may send it before the form). */
export class WalkaroundPhoto extends Model<
  InferAttributes<WalkaroundPhoto>,
  InferCreationAttributes<WalkaroundPhoto>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  declare walkaroundId: string | null;
  /** object-store key without suffix: `${key}.webp` and `${key}-thumb.webp` */
  declare objectKey: string;
  declare uploadedBy: string | null;
  declare createdAt: CreationOptional<Date>;
}

WalkaroundPhoto.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    walkaroundId: { type: DataTypes.UUID, allowNull: true },
    objectKey: { type: DataTypes.TEXT, allowNull: false },
    uploadedBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'walkaround_photos', updatedAt: false },
);
