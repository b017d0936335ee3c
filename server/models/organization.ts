import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { OrganizationKind, UnitSystem } from '../../shared/constants';

export class Organization extends Model<
  InferAttributes<Organization>,
  InferCreationAttributes<Organization>
> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare kind: OrganizationKind;
  declare timeZone: CreationOptional<string>;
  declare units: CreationOptional<UnitSystem>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Organization.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    name: { type: DataTypes.TEXT, allowNull: false },
    kind: { type: DataTypes.TEXT, allowNull: false },
    timeZone: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'UTC' },
    units: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'metric' },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'organizations' },
);
