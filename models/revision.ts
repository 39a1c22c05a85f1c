import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Plan } from './plan';
import type { Team } from './team';
import type { Upload } from './upload';
import type { User } from './user';

// A frozen revision of a plan: its document, scale and full analysis as submitted. Never
// changed after it is written, except for the review's outcome (state, reviewer, the reviewer's note).
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare planId: ForeignKey<Plan['id']>;
  declare number: number;
  declare planVersion: number;
  declare planName: string;
  declare metresPerPixel: number;
  declare document: unknown;
  declare analysis: unknown;
  declare extras: CreationOptional<object>;
  declare backgroundUploadId: ForeignKey<Upload['id']> | null;
  declare state: string;
  declare note: CreationOptional<string>;
  declare submittedById: ForeignKey<User['id']> | null;
  declare submittedByName: string;
  declare reviewedById: ForeignKey<User['id']> | null;
  declare reviewedByName: string | null;
  declare reviewedAt: Date | null;
  declare reviewNote: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
}

Revision.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    number: { type: DataTypes.INTEGER, allowNull: false },
    planVersion: { type: DataTypes.INTEGER, allowNull: false },
    planName: { type: DataTypes.STRING(160), allowNull: false },
    metresPerPixel: { type: DataTypes.DOUBLE, allowNull: false },
    document: { type: DataTypes.JSONB, allowNull: false },
    analysis: { type: DataTypes.JSONB, allowNull: false },
    extras: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    state: { type: DataTypes.STRING(30), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    submittedByName: { type: DataTypes.STRING(200), allowNull: false },
    reviewedByName: { type: DataTypes.STRING(200), allowNull: true },
    reviewedAt: { type: DataTypes.DATE, allowNull: true },
    reviewNote: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'revisions', modelName: 'Revision', updatedAt: false },
);
