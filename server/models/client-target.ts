import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ClientTargets } from '../../shared/schemas/coaching';

export class ClientTarget extends Model<InferAttributes<ClientTarget>, InferCreationAttributes<ClientTarget>> {
  declare clientId: number;
  declare coachId: number;
  declare targets: ClientTargets;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initClientTarget(sequelize: Sequelize) {
  ClientTarget.init(
    {
      clientId: { type: DataTypes.INTEGER, primaryKey: true },
      coachId: { type: DataTypes.INTEGER, allowNull: false },
      targets: { type: DataTypes.JSONB, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'client_targets' },
  );
}
