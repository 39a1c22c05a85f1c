import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '@/lib/db';
import type { Team } from './team';
import type { User } from './user';

// A file a team member uploaded; the bytes live in object storage under storageKey.
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<string>;
  declare teamId: ForeignKey<Team['id']>;
  declare uploadedById: ForeignKey<User['id']> | null;
  declare storageKey: string;
  declare fileName: string;
  declare contentType: string;
  declare bytes: number;
  declare sha256: string;
  declare widthPx: number | null;
  declare heightPx: number | null;
  declare createdAt: CreationOptional<Date>;
}

Upload.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    storageKey: { type: DataTypes.STRING(300), allowNull: false, unique: true },
    fileName: { type: DataTypes.STRING(255), allowNull: false },
    contentType: { type: DataTypes.STRING(100), allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    widthPx: { type: DataTypes.INTEGER, allowNull: true },
    heightPx: { type: DataTypes.INTEGER, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'uploads', modelName: 'Upload', updatedAt: false },
);
