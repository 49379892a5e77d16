import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Certainty, LocatorType, PitchDerivation, WorkflowState } from '@shared/catalogue/vocabulary';
import { certainties, locatorTypes, pitchDerivations, workflowStates } from '@shared/catalogue/vocabulary';
import { User } from './user';
import { Source } from './source';

export class Excerpt extends Model<InferAttributes<Excerpt>, InferCreationAttributes<Excerpt>> {
  declare id: CreationOptional<number>;
  declare publicId: string;
  declare sourceId: number;
  declare locatorType: LocatorType;
  declare locatorValue: string;
  declare facsimilePage: number | null;
  declare diplomatic: string;
  declare normalised: string | null;
  declare translation: string | null;
  declare translationLanguage: string | null;
  declare translator: string | null;
  declare commentary: string | null;
  /** Null means the excerpt takes the source's date. */
  declare dateEdtf: string | null;
  declare dateEarliest: string | null;
  declare dateLatest: string | null;
  declare dateLabel: string | null;
  declare topics: string[];
  declare status: CreationOptional<WorkflowState>;
  declare contributorId: number;
  declare version: CreationOptional<number>;
  declare approvedVersion: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare source?: NonAttribute<Source>;
  declare contributor?: NonAttribute<User>;
  declare mentions?: NonAttribute<InstrumentMention[]>;
  declare pitchTags?: NonAttribute<PitchTag[]>;

  static initModel(sequelize: Sequelize): void {
    Excerpt.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        publicId: { type: DataTypes.STRING(12), allowNull: false, unique: true },
        sourceId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        locatorType: { type: DataTypes.ENUM(...locatorTypes), allowNull: false },
        locatorValue: { type: DataTypes.STRING(40), allowNull: false },
        facsimilePage: DataTypes.INTEGER.UNSIGNED,
        diplomatic: { type: DataTypes.TEXT, allowNull: false },
        normalised: DataTypes.TEXT,
        translation: DataTypes.TEXT,
        translationLanguage: DataTypes.STRING(20),
        translator: DataTypes.STRING(200),
        commentary: DataTypes.TEXT,
        dateEdtf: DataTypes.STRING(100),
        dateEarliest: DataTypes.DATEONLY,
        dateLatest: DataTypes.DATEONLY,
        dateLabel: DataTypes.STRING(120),
        topics: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        status: { type: DataTypes.ENUM(...workflowStates), allowNull: false, defaultValue: 'draft' },
        contributorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        approvedVersion: DataTypes.INTEGER.UNSIGNED,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'excerpts', modelName: 'Excerpt' },
    );
  }

  static associate(): void {
    Excerpt.belongsTo(Source, { foreignKey: 'sourceId', as: 'source' });
    Source.hasMany(Excerpt, { foreignKey: 'sourceId', as: 'excerpts' });
    Excerpt.belongsTo(User, { foreignKey: 'contributorId', as: 'contributor' });
    Excerpt.hasMany(InstrumentMention, { foreignKey: 'excerptId', as: 'mentions' });
    InstrumentMention.belongsTo(Excerpt, { foreignKey: 'excerptId', as: 'excerpt' });
    Excerpt.hasMany(PitchTag, { foreignKey: 'excerptId', as: 'pitchTags' });
    PitchTag.belongsTo(Excerpt, { foreignKey: 'excerptId', as: 'excerpt' });
  }
}

export class InstrumentMention extends Model<InferAttributes<InstrumentMention>, InferCreationAttributes<InstrumentMention>> {
  declare id: CreationOptional<number>;
  declare excerptId: number;
  declare term: string;
  declare language: string;
  declare sizeSlug: string;
  declare certainty: Certainty;
  declare note: string | null;
  declare position: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare excerpt?: NonAttribute<Excerpt>;

  static initModel(sequelize: Sequelize): void {
    InstrumentMention.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        excerptId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        term: { type: DataTypes.STRING(200), allowNull: false },
        language: { type: DataTypes.STRING(20), allowNull: false },
        sizeSlug: { type: DataTypes.STRING(40), allowNull: false },
        certainty: { type: DataTypes.ENUM(...certainties), allowNull: false },
        note: DataTypes.STRING(1000),
        position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'instrument_mentions', modelName: 'InstrumentMention' },
    );
  }
}

export class PitchTag extends Model<InferAttributes<PitchTag>, InferCreationAttributes<PitchTag>> {
  declare id: CreationOptional<number>;
  declare excerptId: number;
  declare statement: string;
  /** DECIMAL comes back from the driver as a string; presenters convert with Number(). */
  declare aHz: number | string;
  declare centsFrom440: number | string;
  declare derivation: PitchDerivation;
  declare note: string | null;
  declare position: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare excerpt?: NonAttribute<Excerpt>;

  static initModel(sequelize: Sequelize): void {
    PitchTag.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        excerptId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        statement: { type: DataTypes.STRING(1000), allowNull: false },
        aHz: { type: DataTypes.DECIMAL(6, 2), allowNull: false },
        centsFrom440: { type: DataTypes.DECIMAL(6, 1), allowNull: false, field: 'cents_from_440' },
        derivation: { type: DataTypes.ENUM(...pitchDerivations), allowNull: false },
        note: DataTypes.STRING(1000),
        position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'pitch_tags', modelName: 'PitchTag' },
    );
  }
}
