import { DataTypes, Model, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/lib/db';

// Refused webhook deliveries that carry no genuine event (no or a wrong signature, a stamp
// outside the tolerance, too large), counted per kind and hour: a flood adds to one row.
export class BillingRefusal extends Model<InferAttributes<BillingRefusal>, InferCreationAttributes<BillingRefusal>> {
  declare kind: string;
  declare windowStart: Date;
  declare count: number;
  declare lastReason: string;
  declare lastAt: Date;
}

BillingRefusal.init(
  {
    kind: { type: DataTypes.STRING(40), primaryKey: true },
    windowStart: { type: DataTypes.DATE, primaryKey: true },
    count: { type: DataTypes.INTEGER, allowNull: false },
    lastReason: { type: DataTypes.STRING(500), allowNull: false },
    lastAt: { type: DataTypes.DATE, allowNull: false },
  },
  { sequelize, tableName: 'billing_refusals', modelName: 'BillingRefusal', timestamps: false },
);
