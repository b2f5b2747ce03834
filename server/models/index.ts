import type { Sequelize } from 'sequelize';
import { User, initUser } from './user';

export { User };

let initialised: Sequelize | null = null;

/** Binds every model to one Sequelize instance (models are module-level classes). */
export function initModels(sequelize: Sequelize) {
  if (initialised === sequelize) return;
  initUser(sequelize);
  initialised = sequelize;
}
