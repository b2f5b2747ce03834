import type { Sequelize } from 'sequelize';
import { User, initUser } from './user';
import { Recipe, RecipeVersion, initRecipes } from './recipe';
import { Swap, Invitation, ClientTarget, VersionComment, PasswordReset, initCoaching } from './coaching';

export { User, Recipe, RecipeVersion, Swap, Invitation, ClientTarget, VersionComment, PasswordReset };

let initialised: Sequelize | null = null;

/** Binds every model to one Sequelize instance (models are module-level classes). */
export function initModels(sequelize: Sequelize) {
  if (initialised === sequelize) return;
  initUser(sequelize);
  initRecipes(sequelize);
  initCoaching(sequelize);
  initialised = sequelize;
}
