import { DataTypes, Model, type ForeignKey, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Team } from './team';
import type { User } from './user';

export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
  declare id: string;
  declare userId: ForeignKey<User['id']>;
  declare expiresAt: Date;
  declare activeTeamId: ForeignKey<Team['id']> | null;
}

Session.init(
  {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    activeTeamId: { type: DataTypes.UUID, allowNull: true },
  },
  { sequelize, tableName: 'sessions', modelName: 'Session', timestamps: false },
);
