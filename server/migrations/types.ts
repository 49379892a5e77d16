import type { QueryInterface } from 'sequelize';

export type Migration = (params: { context: QueryInterface }) => Promise<void>;
