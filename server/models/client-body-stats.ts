import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { BodyStats } from '../../shared/schemas/body-stats';

export class ClientBodyStats extends Model<InferAttributes<ClientBodyStats>, InferCreationAttributes<ClientBodyStats>> {
  declare clientId: number;
  declare coachId: number;
  declare stats: BodyStats;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initClientBodyStats(sequelize: Sequelize) {
  ClientBodyStats.init(
    {
      clientId: { type: DataTypes.INTEGER, primaryKey: true },
      coachId: { type: DataTypes.INTEGER, allowNull: false },
      stats: { type: DataTypes.JSONB, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'client_body_stats' },
  );
}
