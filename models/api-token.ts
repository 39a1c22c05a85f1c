import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Role } from '@/lib/permissions';
import type { Team } from './team';
import type { User } from './user';

// A personal API token (lib/auth/api-tokens.ts): its hash, the team and role it acts in, and its life.
export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
  declare id: string;
  declare userId: ForeignKey<User['id']>;
  declare teamId: ForeignKey<Team['id']>;
  declare name: string;
  declare role: Role;
  declare tokenHash: string;
  /** The token's first characters, shown in the list so a person can tell tokens apart. */
  declare prefix: string;
  declare expiresAt: Date;
  declare lastUsedAt: Date | null;
  declare revokedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
}

ApiToken.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true },
    name: { type: DataTypes.STRING(80), allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    prefix: { type: DataTypes.STRING(12), allowNull: false },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    lastUsedAt: { type: DataTypes.DATE, allowNull: true },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: 'api_tokens', modelName: 'ApiToken', timestamps: false },
);
