import { DataTypes, Model, type Sequelize } from 'sequelize';

/** Rows of express-session's store (connect-session-sequelize); the table comes from a migration. */
export class Session extends Model {
  static initModel(sequelize: Sequelize): void {
    Session.init(
      {
        sid: { type: DataTypes.STRING(64), primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        expires: DataTypes.DATE,
        data: DataTypes.TEXT('medium'),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sessions', modelName: 'Session' },
    );
  }
}
