import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Plan } from './plan';

// The stored analysis of one plan version: its content's hash, the analysis format, the analysis,
// and the candidate treatments of its flags as they are evaluated.
export class PlanAnalysisRow extends Model<InferAttributes<PlanAnalysisRow>, InferCreationAttributes<PlanAnalysisRow>> {
  declare id: CreationOptional<string>;
  declare planId: ForeignKey<Plan['id']>;
  declare contentHash: string;
  declare format: number;
  declare analysis: unknown;
  declare candidates: CreationOptional<unknown>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

PlanAnalysisRow.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    contentHash: { type: DataTypes.STRING(64), allowNull: false },
    format: { type: DataTypes.INTEGER, allowNull: false },
    analysis: { type: DataTypes.JSONB, allowNull: false },
    candidates: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'plan_analyses', modelName: 'PlanAnalysisRow' },
);
