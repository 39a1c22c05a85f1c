import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/lib/db';

export class Team extends Model<InferAttributes<Team>, InferCreationAttributes<Team>> {
  declare id: CreationOptional<string>;
  declare name: string;
  /** The practice's name on its treatment schedules (the team's name when null). */
  declare practiceName: CreationOptional<string | null>;
  /** The practice's logo (an upload, PNG or JPEG) on its treatment schedules. */
  declare logoUploadId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Team.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    name: { type: DataTypes.STRING(120), allowNull: false },
    practiceName: { type: DataTypes.STRING(120), allowNull: true },
    logoUploadId: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'teams', modelName: 'Team' },
);
