import { DataTypes, Model, type ForeignKey, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/lib/db';
import type { User } from './user';

// A browser that signed in to an account before (its cookie's token, hashed): failed sign-ins by
// others slow it down less (lib/auth/known-devices.ts).
export class KnownDevice extends Model<InferAttributes<KnownDevice>, InferCreationAttributes<KnownDevice>> {
  declare tokenHash: string;
  declare userId: ForeignKey<User['id']>;
  declare createdAt: Date;
  declare lastUsedAt: Date;
}

KnownDevice.init(
  {
    tokenHash: { type: DataTypes.STRING(64), primaryKey: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    lastUsedAt: { type: DataTypes.DATE, allowNull: false },
  },
  { sequelize, tableName: 'known_devices', modelName: 'KnownDevice', timestamps: false },
);
