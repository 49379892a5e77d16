import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import { User } from './user';

export type EntityType = 'source' | 'excerpt';

/** A full snapshot of a source or excerpt at one version; never updated, never deleted. */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<number>;
  declare entityType: EntityType;
  declare entityId: number;
  declare version: number;
  declare snapshot: Record<string, unknown>;
  declare authorId: number;
  declare reason: string | null;
  declare createdAt: CreationOptional<Date>;
  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    Revision.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        entityType: { type: DataTypes.ENUM('source', 'excerpt'), allowNull: false },
        entityId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        snapshot: { type: DataTypes.JSON, allowNull: false },
        authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        reason: DataTypes.STRING(500),
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'revisions', modelName: 'Revision', updatedAt: false },
    );
  }

  static associate(): void {
    Revision.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  }
}
