import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { PerformerFields, PieceFields, Visibility } from '@shared/programmes/schema';
import { visibilities } from '@shared/programmes/schema';
import { User } from './user';

/** A reader's programme: pieces, performers, and notes with citation markers. Private unless shared by link. */
export class Programme extends Model<InferAttributes<Programme>, InferCreationAttributes<Programme>> {
  declare id: CreationOptional<number>;
  declare publicId: string;
  declare ownerId: number;
  declare title: string;
  declare performanceDate: string | null;
  declare venue: string | null;
  declare performers: PerformerFields[];
  declare pieces: PieceFields[];
  declare notesMarkdown: string;
  declare citationStyle: string;
  declare visibility: CreationOptional<Visibility>;
  /** 32 random bytes, base64url (43 characters); null when not shared. */
  declare shareToken: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare owner?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    Programme.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        publicId: { type: DataTypes.STRING(12), allowNull: false, unique: true },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        title: { type: DataTypes.STRING(300), allowNull: false },
        performanceDate: DataTypes.DATEONLY,
        venue: DataTypes.STRING(255),
        performers: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        pieces: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        notesMarkdown: { type: DataTypes.TEXT('medium'), allowNull: false, defaultValue: '' },
        citationStyle: { type: DataTypes.STRING(200), allowNull: false, defaultValue: 'notes' },
        visibility: { type: DataTypes.ENUM(...visibilities), allowNull: false, defaultValue: 'private' },
        shareToken: { type: DataTypes.STRING(64), allowNull: true, unique: true },
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'programmes', modelName: 'Programme' },
    );
  }

  static associate(): void {
    Programme.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' });
  }
}
