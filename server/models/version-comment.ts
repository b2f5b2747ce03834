import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class VersionComment extends Model<InferAttributes<VersionComment>, InferCreationAttributes<VersionComment>> {
  declare id: CreationOptional<number>;
  declare recipeVersionId: number;
  declare authorId: number;
  declare body: string;
  /** when the version's owner first read it; null while it counts as unread (comments by the owner are never unread) */
  declare ownerReadAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initVersionComment(sequelize: Sequelize) {
  VersionComment.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      recipeVersionId: { type: DataTypes.INTEGER, allowNull: false },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      body: { type: DataTypes.TEXT, allowNull: false },
      ownerReadAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'version_comments' },
  );
}
