import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { PublicUser, UnitSystem, UserRole } from '../../shared/schemas/auth';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare passwordHash: string;
  declare displayName: string;
  declare role: UserRole;
  declare coachId: CreationOptional<number | null>;
  declare unitSystem: CreationOptional<UnitSystem>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  toPublic(): PublicUser {
    return {
      id: this.id,
      email: this.email,
      displayName: this.displayName,
      role: this.role,
      coachId: this.coachId ?? null,
      unitSystem: this.unitSystem ?? 'us',
    };
  }
}

export function initUser(sequelize: Sequelize) {
  User.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      passwordHash: { type: DataTypes.STRING(100), allowNull: false },
      displayName: { type: DataTypes.STRING(80), allowNull: false },
      role: { type: DataTypes.STRING(10), allowNull: false },
      coachId: { type: DataTypes.INTEGER, allowNull: true },
      unitSystem: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'us' },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'users' },
  );
}
