import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { EntityType } from './revision';

/** A change the search index has yet to catch up with; written in the same transaction as the change. */
export class SearchOutbox extends Model<InferAttributes<SearchOutbox>, InferCreationAttributes<SearchOutbox>> {
  declare id: CreationOptional<number>;
  declare entityType: EntityType;
  declare entityId: number;
  declare operation: 'upsert' | 'delete';
  declare attempts: CreationOptional<number>;
  declare lastError: string | null;
  declare availableAt: Date;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SearchOutbox.init(
      {
        id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
        entityType: { type: DataTypes.ENUM('source', 'excerpt'), allowNull: false },
        entityId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        operation: { type: DataTypes.ENUM('upsert', 'delete'), allowNull: false },
        attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        lastError: DataTypes.STRING(1000),
        availableAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'search_outbox', modelName: 'SearchOutbox', updatedAt: false },
    );
  }
}
