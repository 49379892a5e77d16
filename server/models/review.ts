import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { ReviewDecision } from '@shared/catalogue/vocabulary';
import { reviewDecisions } from '@shared/catalogue/vocabulary';
import { User } from './user';
import type { EntityType } from './revision';

/** An editor's decision on one version of a source or excerpt, with comments (optionally per field). */
export class Review extends Model<InferAttributes<Review>, InferCreationAttributes<Review>> {
  declare id: CreationOptional<number>;
  declare entityType: EntityType;
  declare entityId: number;
  declare version: number;
  declare editorId: number;
  declare decision: ReviewDecision;
  declare comment: string | null;
  declare fieldComments: { field: string; comment: string }[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare editor?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    Review.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        entityType: { type: DataTypes.ENUM('source', 'excerpt'), allowNull: false },
        entityId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        editorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        decision: { type: DataTypes.ENUM(...reviewDecisions), allowNull: false },
        comment: DataTypes.TEXT,
        fieldComments: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'reviews', modelName: 'Review' },
    );
  }

  static associate(): void {
    Review.belongsTo(User, { foreignKey: 'editorId', as: 'editor' });
  }
}
