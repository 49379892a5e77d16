import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { CalendarNote, CreatorRole, FacsimileAccess, SourceType, WorkflowState } from '@shared/catalogue/vocabulary';
import { sourceTypes, calendarNotes, facsimileAccessLevels, workflowStates } from '@shared/catalogue/vocabulary';
import { User } from './user';
import type { Excerpt } from './excerpt';
import type { Facsimile } from './facsimile';

export interface Creator {
  name: string;
  role: CreatorRole;
}
export interface Publication {
  publisher: string | null;
  place: string | null;
  edition: string | null;
}

export class Source extends Model<InferAttributes<Source>, InferCreationAttributes<Source>> {
  declare id: CreationOptional<number>;
  declare publicId: string;
  declare title: string;
  declare sourceType: SourceType;
  declare creators: Creator[];
  declare dateEdtf: string;
  declare dateEarliest: string;
  declare dateLatest: string;
  declare dateLabel: string;
  declare calendarNote: CreationOptional<CalendarNote>;
  declare place: string | null;
  declare languages: string[];
  declare holdingInstitution: string | null;
  declare shelfmark: string | null;
  declare publication: Publication | null;
  declare externalUrl: string | null;
  declare rightsStatement: string | null;
  declare facsimileAccess: CreationOptional<FacsimileAccess>;
  declare status: CreationOptional<WorkflowState>;
  declare contributorId: number;
  declare version: CreationOptional<number>;
  declare approvedVersion: number | null;
  declare submittedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare contributor?: NonAttribute<User>;
  declare excerpts?: NonAttribute<Excerpt[]>;
  declare facsimiles?: NonAttribute<Facsimile[]>;

  static initModel(sequelize: Sequelize): void {
    Source.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        publicId: { type: DataTypes.STRING(12), allowNull: false, unique: true },
        title: { type: DataTypes.STRING(500), allowNull: false },
        sourceType: { type: DataTypes.ENUM(...sourceTypes), allowNull: false },
        creators: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        dateEdtf: { type: DataTypes.STRING(100), allowNull: false },
        dateEarliest: { type: DataTypes.DATEONLY, allowNull: false },
        dateLatest: { type: DataTypes.DATEONLY, allowNull: false },
        dateLabel: { type: DataTypes.STRING(120), allowNull: false },
        calendarNote: { type: DataTypes.ENUM(...calendarNotes), allowNull: false, defaultValue: 'unstated' },
        place: DataTypes.STRING(255),
        languages: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        holdingInstitution: DataTypes.STRING(255),
        shelfmark: DataTypes.STRING(255),
        publication: DataTypes.JSON,
        externalUrl: DataTypes.STRING(1000),
        rightsStatement: DataTypes.TEXT,
        facsimileAccess: { type: DataTypes.ENUM(...facsimileAccessLevels), allowNull: false, defaultValue: 'signed-in' },
        status: { type: DataTypes.ENUM(...workflowStates), allowNull: false, defaultValue: 'draft' },
        contributorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        approvedVersion: DataTypes.INTEGER.UNSIGNED,
        submittedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sources', modelName: 'Source' },
    );
  }

  static associate(): void {
    Source.belongsTo(User, { foreignKey: 'contributorId', as: 'contributor' });
  }
}
