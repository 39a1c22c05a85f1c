import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/lib/db';

// Failed sign-ins counted per key ("email:…" or "ip:…") within a window.
export class SignInThrottle extends Model<InferAttributes<SignInThrottle>, InferCreationAttributes<SignInThrottle>> {
  declare key: string;
  declare failures: number;
  declare windowStartedAt: Date;
  declare lockedUntil: CreationOptional<Date | null>;
}

SignInThrottle.init(
  {
    key: { type: DataTypes.STRING(400), primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false },
    windowStartedAt: { type: DataTypes.DATE, allowNull: false },
    lockedUntil: { type: DataTypes.DATE, allowNull: true },
  },
  { sequelize, tableName: 'sign_in_throttles', modelName: 'SignInThrottle', timestamps: false },
);
