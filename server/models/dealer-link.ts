import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from 'sequelize';
import { sequelize } from '../db';
import type { DealerAccess, DealerLinkStatus } from '../../shared/schemas/dealers';
import type { Organization } from './organization';

/** A farm's grant of access to a dealer (pending while the dealer's request waits for the farm). */
export class DealerLink extends Model<
  InferAttributes<DealerLink>,
  InferCreationAttributes<DealerLink>
> {
  declare id: CreationOptional<string>;
  declare dealerOrganizationId: string;
  declare farmOrganizationId: string | null;
  declare access: DealerAccess;
  declare status: DealerLinkStatus;
  declare initiatedBy: 'dealer' | 'farm';
  declare invitedBy: string | null;
  declare invitedEmail: CreationOptional<string>;
  declare message: CreationOptional<string>;
  declare tokenHash: string | null;
  declare expiresAt: Date | null;
  declare acceptedBy: string | null;
  declare acceptedAt: Date | null;
  declare revokedBy: string | null;
  declare revokedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare dealer?: NonAttribute<Organization>;
  declare farm?: NonAttribute<Organization>;
}

DealerLink.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    dealerOrganizationId: { type: DataTypes.UUID, allowNull: false },
    farmOrganizationId: { type: DataTypes.UUID, allowNull: true },
    access: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.TEXT, allowNull: false },
    initiatedBy: { type: DataTypes.TEXT, allowNull: false },
    invitedBy: { type: DataTypes.UUID, allowNull: true },
    invitedEmail: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    message: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    tokenHash: { type: DataTypes.TEXT, allowNull: true },
    expiresAt: { type: DataTypes.DATE, allowNull: true },
    acceptedBy: { type: DataTypes.UUID, allowNull: true },
    acceptedAt: { type: DataTypes.DATE, allowNull: true },
    revokedBy: { type: DataTypes.UUID, allowNull: true },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'dealer_links' },
);
