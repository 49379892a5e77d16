import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('programmes', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    public_id: { type: DataTypes.STRING(12), allowNull: false, unique: true },
    owner_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(300), allowNull: false },
    performance_date: { type: DataTypes.DATEONLY, allowNull: true },
    venue: { type: DataTypes.STRING(255), allowNull: true },
    performers: { type: DataTypes.JSON, allowNull: false },
    pieces: { type: DataTypes.JSON, allowNull: false },
    notes_markdown: { type: DataTypes.TEXT('medium'), allowNull: false },
    citation_style: { type: DataTypes.STRING(200), allowNull: false, defaultValue: 'notes' },
    visibility: { type: DataTypes.ENUM('private', 'shared'), allowNull: false, defaultValue: 'private' },
    share_token: { type: DataTypes.STRING(64), allowNull: true, unique: true },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('programmes', ['owner_id', 'updated_at']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('programmes');
};
