import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Project } from './project';
import type { Upload } from './upload';
import type { User } from './user';

// A plan: a background (or a blank grid), its scale, and the drawn document (validated by
// the plan document schema in lib/plan). `version` guards against stale saves.
export class Plan extends Model<InferAttributes<Plan>, InferCreationAttributes<Plan>> {
  declare id: CreationOptional<string>;
  declare projectId: ForeignKey<Project['id']>;
  declare name: string;
  declare backgroundUploadId: ForeignKey<Upload['id']> | null;
  declare metresPerPixel: CreationOptional<number>;
  declare version: CreationOptional<number>;
  /** Version of the name and archive state (renames and archiving carry it). */
  declare detailsVersion: CreationOptional<number>;
  declare document: unknown;
  declare archived: CreationOptional<boolean>;
  declare updatedById: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Plan.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    name: { type: DataTypes.STRING(160), allowNull: false },
    metresPerPixel: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.01 },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    detailsVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    document: { type: DataTypes.JSONB, allowNull: false },
    archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'plans', modelName: 'Plan' },
);
