import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { MachineCategory } from '../../shared/constants';
import type { StoredTaskInput } from '../../shared/schemas/schedule';

export class ScheduleTemplate extends Model<
  InferAttributes<ScheduleTemplate>,
  InferCreationAttributes<ScheduleTemplate>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare category: MachineCategory;
  declare name: string;
  declare description: CreationOptional<string>;
  declare tasks: CreationOptional<StoredTaskInput[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

ScheduleTemplate.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    category: { type: DataTypes.TEXT, allowNull: false },
    name: { type: DataTypes.TEXT, allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    tasks: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'schedule_templates' },
);
