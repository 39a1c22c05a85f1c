import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Team } from './team';
import type { User } from './user';

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare actorId: ForeignKey<User['id']> | null;
  declare actorName: string;
  declare action: string;
  declare subject: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
}

AuditEvent.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    actorName: { type: DataTypes.STRING(200), allowNull: false },
    action: { type: DataTypes.STRING(60), allowNull: false },
    subject: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'audit_events', modelName: 'AuditEvent', updatedAt: false },
);
