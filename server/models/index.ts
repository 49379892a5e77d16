import type { Sequelize } from 'sequelize';
import { User } from './user';
import { Session } from './session';
import { PasswordReset } from './password-reset';

export { User, Session, PasswordReset };

interface RegisteredModel {
  initModel(sequelize: Sequelize): void;
  associate?(): void;
}

/**
 * Every model of the app, in dependency order. A feature adds its model here; the
 * model's own static `associate()` declares its associations, and a migration in
 * server/migrations creates its table.
 */
const registry: RegisteredModel[] = [User, Session, PasswordReset];

export function initModels(sequelize: Sequelize): void {
  for (const model of registry) model.initModel(sequelize);
  for (const model of registry) model.associate?.();
}
