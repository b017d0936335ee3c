import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { ApiKeyScope } from '../../shared/schemas/api-keys';

/** An organization's key for machine data (migration 0027): the secret only as its SHA-256. */
export class ApiKey extends Model<InferAttributes<ApiKey>, InferCreationAttributes<ApiKey>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare name: string;
  /** shown to people to tell keys apart; the key reads `hs_<prefix>_<secret>` */
  declare prefix: string;
  declare secretHash: Buffer;
  declare scopes: ApiKeyScope[];
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare lastUsedAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
}

ApiKey.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    name: { type: DataTypes.TEXT, allowNull: false },
    prefix: { type: DataTypes.TEXT, allowNull: false },
    secretHash: { type: DataTypes.BLOB, allowNull: false },
    scopes: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
    lastUsedAt: { type: DataTypes.DATE, allowNull: true },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
  },
  { sequelize, tableName: 'api_keys', updatedAt: false },
);
