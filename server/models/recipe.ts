import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Nutrients } from '../../shared/nutrition';
import type { StoredLine, VersionKind } from '../../shared/schemas/recipes';
import type { TargetsInput } from '../../shared/schemas/rewrite';

export class Recipe extends Model<InferAttributes<Recipe>, InferCreationAttributes<Recipe>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare title: string;
  declare servings: number;
  declare notes: CreationOptional<string>;
  declare method: CreationOptional<string>;
  declare photoKey: CreationOptional<string | null>;
  declare photoType: CreationOptional<string | null>;
  declare revision: CreationOptional<number>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class RecipeVersion extends Model<InferAttributes<RecipeVersion>, InferCreationAttributes<RecipeVersion>> {
  declare id: CreationOptional<number>;
  declare recipeId: number;
  declare number: number;
  declare kind: VersionKind;
  declare parentNumber: number | null;
  declare servings: number;
  declare lines: StoredLine[];
  declare targets: TargetsInput | null;
  declare totals: Nutrients;
  declare perServing: Nutrients;
  declare volumeMl: number;
  declare note: CreationOptional<string>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initRecipes(sequelize: Sequelize) {
  Recipe.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      ownerId: { type: DataTypes.INTEGER, allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      servings: { type: DataTypes.INTEGER, allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      method: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      photoKey: { type: DataTypes.STRING(200), allowNull: true },
      photoType: { type: DataTypes.STRING(40), allowNull: true },
      revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'recipes' },
  );
  RecipeVersion.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      recipeId: { type: DataTypes.INTEGER, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      kind: { type: DataTypes.STRING(10), allowNull: false },
      parentNumber: { type: DataTypes.INTEGER, allowNull: true },
      servings: { type: DataTypes.INTEGER, allowNull: false },
      lines: { type: DataTypes.JSONB, allowNull: false },
      targets: { type: DataTypes.JSONB, allowNull: true },
      totals: { type: DataTypes.JSONB, allowNull: false },
      perServing: { type: DataTypes.JSONB, allowNull: false },
      volumeMl: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      createdBy: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'recipe_versions' },
  );
  Recipe.hasMany(RecipeVersion, { foreignKey: 'recipeId', as: 'versions' });
  RecipeVersion.belongsTo(Recipe, { foreignKey: 'recipeId' });
}
