import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Role } from '@/lib/permissions';
import type { Team } from './team';
import type { User } from './user';

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<string>;
  declare userId: ForeignKey<User['id']>;
  declare teamId: ForeignKey<Team['id']>;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare team?: NonAttribute<Team>;
  declare user?: NonAttribute<User>;
}

Membership.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    role: { type: DataTypes.STRING(20), allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'memberships', modelName: 'Membership' },
);
