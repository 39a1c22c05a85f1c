import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Team } from './team';

// included: only the seats every team gets; active: paid; past_due: a payment failed
// (read-only grace period); canceled: the subscription ended.
export type BillingState = 'included' | 'active' | 'past_due' | 'canceled';

export class TeamBilling extends Model<InferAttributes<TeamBilling>, InferCreationAttributes<TeamBilling>> {
  declare teamId: ForeignKey<Team['id']>;
  declare customerId: CreationOptional<string | null>;
  declare subscriptionId: CreationOptional<string | null>;
  declare paidSeats: CreationOptional<number>;
  declare requestedSeats: CreationOptional<number | null>;
  declare state: CreationOptional<BillingState>;
  declare paymentFailedAt: CreationOptional<Date | null>;
  declare lastEventAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

TeamBilling.init(
  {
    teamId: { type: DataTypes.UUID, primaryKey: true },
    customerId: { type: DataTypes.STRING(255), allowNull: true, unique: true },
    subscriptionId: { type: DataTypes.STRING(255), allowNull: true, unique: true },
    paidSeats: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    requestedSeats: { type: DataTypes.INTEGER, allowNull: true },
    state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'included' },
    paymentFailedAt: { type: DataTypes.DATE, allowNull: true },
    lastEventAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'team_billing', modelName: 'TeamBilling' },
);
