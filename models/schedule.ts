import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Revision } from './revision';
import type { Team } from './team';
import type { User } from './user';

// A treatment schedule of a revision: asked for (rendering, by the job worker), then issued (its PDF
// in object storage with its SHA-256) or failed (with the reason).
export type ScheduleStatus = 'rendering' | 'issued' | 'failed';

export class Schedule extends Model<InferAttributes<Schedule>, InferCreationAttributes<Schedule>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare revisionId: ForeignKey<Revision['id']>;
  declare status: CreationOptional<ScheduleStatus>;
  declare failure: CreationOptional<string | null>;
  declare storageKey: CreationOptional<string | null>;
  declare sha256: CreationOptional<string | null>;
  declare bytes: CreationOptional<number | null>;
  declare issuedAt: CreationOptional<Date | null>;
  declare issuedById: ForeignKey<User['id']> | null;
  declare issuedByName: string;
  declare createdAt: CreationOptional<Date>;
}

Schedule.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'rendering' },
    failure: { type: DataTypes.TEXT, allowNull: true },
    storageKey: { type: DataTypes.STRING(300), allowNull: true },
    sha256: { type: DataTypes.STRING(64), allowNull: true },
    bytes: { type: DataTypes.INTEGER, allowNull: true },
    issuedAt: { type: DataTypes.DATE, allowNull: true },
    issuedByName: { type: DataTypes.STRING(200), allowNull: false },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'schedules', modelName: 'Schedule', updatedAt: false },
);
