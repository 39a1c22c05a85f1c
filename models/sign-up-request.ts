import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '@/lib/db';

// A sign-up waiting for its e-mail to be confirmed: nothing exists until the mailed link is used.
// The password is stored only as its argon2id hash, the link only as its SHA-256 hash.
export class SignUpRequest extends Model<InferAttributes<SignUpRequest>, InferCreationAttributes<SignUpRequest>> {
  declare id: CreationOptional<string>;
  declare email: string;
  declare name: string;
  declare teamName: string;
  declare passwordHash: string;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
}

SignUpRequest.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    email: { type: DataTypes.STRING(320), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    teamName: { type: DataTypes.STRING(120), allowNull: false },
    passwordHash: { type: DataTypes.STRING(255), allowNull: false },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    usedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'sign_up_requests', modelName: 'SignUpRequest', updatedAt: false },
);
