import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Team } from './team';

// queued: verified and recorded, waiting for its job; applied: changed the team's billing;
// ignored: a kind we do not act on, or no team matched; refused: signed but malformed;
// failed: its job gave up (the payment service could not be asked on any try).
export type BillingEventOutcome = 'queued' | 'applied' | 'ignored' | 'refused' | 'failed';

export class BillingEvent extends Model<InferAttributes<BillingEvent>, InferCreationAttributes<BillingEvent>> {
  declare id: CreationOptional<string>;
  declare providerEventId: string | null;
  declare type: string | null;
  declare teamId: ForeignKey<Team['id']> | null;
  declare outcome: BillingEventOutcome;
  declare reason: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
}

BillingEvent.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    providerEventId: { type: DataTypes.STRING(255), allowNull: true, unique: true },
    type: { type: DataTypes.STRING(120), allowNull: true },
    outcome: { type: DataTypes.STRING(20), allowNull: false },
    reason: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'billing_events', modelName: 'BillingEvent', updatedAt: false },
);
