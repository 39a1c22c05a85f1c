import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Revision } from './revision';
import type { Team } from './team';
import type { User } from './user';

// An issued treatment schedule: the PDF of a revision in object storage, with its SHA-256.
export class Schedule extends Model<InferAttributes<Schedule>, InferCreationAttributes<Schedule>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare revisionId: ForeignKey<Revision['id']>;
  declare storageKey: string;
  declare sha256: string;
  declare bytes: number;
  declare issuedById: ForeignKey<User['id']> | null;
  declare issuedByName: string;
  declare createdAt: CreationOptional<Date>;
}

Schedule.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    storageKey: { type: DataTypes.STRING(300), allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    issuedByName: { type: DataTypes.STRING(200), allowNull: false },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'schedules', modelName: 'Schedule', updatedAt: false },
);
