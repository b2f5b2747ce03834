import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

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

export function initSwap(sequelize: Sequelize) {
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
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'swaps' },
  );
}
