import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Plan } from './plan';
import type { Team } from './team';
import type { User } from './user';

// One line of a plan's activity: who did what, when, and where to look.
export class PlanActivity extends Model<InferAttributes<PlanActivity>, InferCreationAttributes<PlanActivity>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare planId: ForeignKey<Plan['id']>;
  declare actorId: ForeignKey<User['id']> | null;
  declare actorName: string;
  declare kind: string;
  declare summary: string;
  declare link: string | null;
  declare createdAt: CreationOptional<Date>;
}

PlanActivity.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    actorName: { type: DataTypes.STRING(200), allowNull: false },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    summary: { type: DataTypes.STRING(500), allowNull: false },
    link: { type: DataTypes.STRING(300), allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'plan_activities', modelName: 'PlanActivity', updatedAt: false },
);
