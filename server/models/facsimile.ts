import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import { Source } from './source';
import { User } from './user';

export type ExtractionStatus = 'pending' | 'running' | 'done' | 'failed';

export class Facsimile extends Model<InferAttributes<Facsimile>, InferCreationAttributes<Facsimile>> {
  declare id: CreationOptional<number>;
  declare sourceId: number;
  /** Key in the file store (content-addressed by SHA-256). */
  declare storageKey: string;
  declare originalName: string;
  declare mediaType: string;
  declare byteSize: number;
  declare sha256: string;
  declare pageCount: number | null;
  declare extractionStatus: CreationOptional<ExtractionStatus>;
  declare extractionProgress: CreationOptional<number>;
  declare extractionError: string | null;
  /** Extracted text, one string per page (index 0 = page 1). */
  declare pageTexts: string[] | null;
  declare rightsConfirmedAt: Date;
  declare uploadedById: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare source?: NonAttribute<Source>;

  static initModel(sequelize: Sequelize): void {
    Facsimile.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        sourceId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        storageKey: { type: DataTypes.STRING(255), allowNull: false },
        originalName: { type: DataTypes.STRING(255), allowNull: false },
        mediaType: { type: DataTypes.STRING(100), allowNull: false },
        byteSize: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        pageCount: DataTypes.INTEGER.UNSIGNED,
        extractionStatus: { type: DataTypes.ENUM('pending', 'running', 'done', 'failed'), allowNull: false, defaultValue: 'pending' },
        extractionProgress: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        extractionError: DataTypes.STRING(1000),
        pageTexts: DataTypes.JSON,
        rightsConfirmedAt: { type: DataTypes.DATE, allowNull: false },
        uploadedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'facsimiles', modelName: 'Facsimile' },
    );
  }

  static associate(): void {
    Facsimile.belongsTo(Source, { foreignKey: 'sourceId', as: 'source' });
    Source.hasMany(Facsimile, { foreignKey: 'sourceId', as: 'facsimiles' });
    Facsimile.belongsTo(User, { foreignKey: 'uploadedById', as: 'uploadedBy' });
  }
}
