import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Plan } from './plan';
import type { Revision } from './revision';
import type { Team } from './team';
import type { User } from './user';

// A comment pinned on a plan (plan pixels) or on a table row; answers point at their parent.
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare planId: ForeignKey<Plan['id']>;
  declare revisionId: ForeignKey<Revision['id']> | null;
  declare parentId: ForeignKey<Comment['id']> | null;
  declare xPx: number | null;
  declare yPx: number | null;
  declare target: string | null;
  declare body: string;
  declare authorId: ForeignKey<User['id']> | null;
  declare authorName: string;
  declare resolvedAt: Date | null;
  declare resolvedByName: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Comment.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    xPx: { type: DataTypes.DOUBLE, allowNull: true },
    yPx: { type: DataTypes.DOUBLE, allowNull: true },
    target: { type: DataTypes.STRING(200), allowNull: true },
    body: { type: DataTypes.TEXT, allowNull: false },
    authorName: { type: DataTypes.STRING(200), allowNull: false },
    resolvedAt: { type: DataTypes.DATE, allowNull: true },
    resolvedByName: { type: DataTypes.STRING(200), allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'comments', modelName: 'Comment' },
);
