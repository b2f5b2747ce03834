import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ClientTargets } from '../../shared/schemas/coaching';

export class Swap extends Model<InferAttributes<Swap>, InferCreationAttributes<Swap>> {
  declare id: CreationOptional<number>;
  declare coachId: number;
  declare fromFoodId: number | null;
  declare fromRole: string | null;
  declare toFoodId: number;
  declare volumeRatio: number;
  declare note: string;
  declare tags: string[];
  declare status: 'draft' | 'published';
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare coachId: number;
  declare email: string;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare acceptedBy: CreationOptional<number | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class ClientTarget extends Model<InferAttributes<ClientTarget>, InferCreationAttributes<ClientTarget>> {
  declare clientId: number;
  declare coachId: number;
  declare targets: ClientTargets;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class VersionComment extends Model<InferAttributes<VersionComment>, InferCreationAttributes<VersionComment>> {
  declare id: CreationOptional<number>;
  declare recipeVersionId: number;
  declare authorId: number;
  declare body: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class PasswordReset extends Model<InferAttributes<PasswordReset>, InferCreationAttributes<PasswordReset>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCoaching(sequelize: Sequelize) {
  const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };
  Swap.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      coachId: { type: DataTypes.INTEGER, allowNull: false },
      fromFoodId: { type: DataTypes.INTEGER, allowNull: true },
      fromRole: { type: DataTypes.STRING(40), allowNull: true },
      toFoodId: { type: DataTypes.INTEGER, allowNull: false },
      volumeRatio: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1 },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      tags: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
      status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'draft' },
      ...stamps,
    },
    { sequelize, tableName: 'swaps' },
  );
  Invitation.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      coachId: { type: DataTypes.INTEGER, allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      acceptedBy: { type: DataTypes.INTEGER, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { sequelize, tableName: 'invitations' },
  );
  ClientTarget.init(
    {
      clientId: { type: DataTypes.INTEGER, primaryKey: true },
      coachId: { type: DataTypes.INTEGER, allowNull: false },
      targets: { type: DataTypes.JSONB, allowNull: false },
      ...stamps,
    },
    { sequelize, tableName: 'client_targets' },
  );
  VersionComment.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      recipeVersionId: { type: DataTypes.INTEGER, allowNull: false },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      body: { type: DataTypes.TEXT, allowNull: false },
      ...stamps,
    },
    { sequelize, tableName: 'version_comments' },
  );
  PasswordReset.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER, allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { sequelize, tableName: 'password_resets' },
  );
}
