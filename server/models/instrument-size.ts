import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** The size vocabulary editors maintain; seeded from shared/reckoner/sizes.ts. */
export class InstrumentSizeRecord extends Model<InferAttributes<InstrumentSizeRecord>, InferCreationAttributes<InstrumentSizeRecord>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare family: string;
  declare name: string;
  declare otherNames: string[];
  declare nominalNote: string;
  declare writtenOctaveOffset: number;
  declare rangeLowest: string;
  declare rangeHighest: string;
  declare hornbostelSachs: string;
  declare sortOrder: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    InstrumentSizeRecord.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        slug: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        family: { type: DataTypes.STRING(40), allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        otherNames: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        nominalNote: { type: DataTypes.STRING(8), allowNull: false },
        writtenOctaveOffset: { type: DataTypes.TINYINT, allowNull: false },
        rangeLowest: { type: DataTypes.STRING(8), allowNull: false },
        rangeHighest: { type: DataTypes.STRING(8), allowNull: false },
        hornbostelSachs: { type: DataTypes.STRING(40), allowNull: false },
        sortOrder: { type: DataTypes.SMALLINT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'instrument_sizes', modelName: 'InstrumentSize' },
    );
  }
}
