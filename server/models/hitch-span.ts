import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { HitchMeterKind } from '../../shared/schemas/hitch';

/** An implement on a tractor from `startedAt` until `endedAt` (null: still hitched), migration 0028. */
export class HitchSpan extends Model<
  InferAttributes<HitchSpan>,
  InferCreationAttributes<HitchSpan>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare implementId: string;
  declare tractorId: string;
  /** the tractor's meter the implement counts its hours from */
  declare meterKind: HitchMeterKind;
  declare startedAt: Date;
  declare endedAt: Date | null;
  declare enteredBy: string | null;
  declare note: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

HitchSpan.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    implementId: { type: DataTypes.UUID, allowNull: false },
    tractorId: { type: DataTypes.UUID, allowNull: false },
    meterKind: { type: DataTypes.TEXT, allowNull: false },
    startedAt: { type: DataTypes.DATE, allowNull: false },
    endedAt: { type: DataTypes.DATE, allowNull: true },
    enteredBy: { type: DataTypes.UUID, allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'hitch_spans' },
);
