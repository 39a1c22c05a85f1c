import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Revision } from './revision';
import type { User } from './user';

// One reviewer's decision on one row of a revision (a resonance or a risk flag), with a note.
export class ReviewDecision extends Model<InferAttributes<ReviewDecision>, InferCreationAttributes<ReviewDecision>> {
  declare id: CreationOptional<string>;
  declare revisionId: ForeignKey<Revision['id']>;
  declare target: string;
  declare decision: string;
  declare note: CreationOptional<string>;
  declare reviewerId: ForeignKey<User['id']> | null;
  declare reviewerName: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

ReviewDecision.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    target: { type: DataTypes.STRING(200), allowNull: false },
    decision: { type: DataTypes.STRING(20), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    reviewerName: { type: DataTypes.STRING(200), allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'review_decisions', modelName: 'ReviewDecision' },
);
