import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { User } from './user';

// One kind of mail a person turned on or off; no row means on.
export class NotificationSetting extends Model<InferAttributes<NotificationSetting>, InferCreationAttributes<NotificationSetting>> {
  declare id: CreationOptional<string>;
  declare userId: ForeignKey<User['id']>;
  declare kind: string;
  declare enabled: boolean;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

NotificationSetting.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    enabled: { type: DataTypes.BOOLEAN, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'notification_settings', modelName: 'NotificationSetting' },
);
