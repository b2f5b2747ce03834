import type { Sequelize } from 'sequelize';
import { User, initUser } from './user';
import { Recipe, RecipeVersion, initRecipes } from './recipe';
import { Swap, initSwap } from './swap';
import { Invitation, initInvitation } from './invitation';
import { ClientTarget, initClientTarget } from './client-target';
import { ClientBodyStats, initClientBodyStats } from './client-body-stats';
import { VersionComment, initVersionComment } from './version-comment';
import { PasswordReset, initPasswordReset } from './password-reset';

export { User, Recipe, RecipeVersion, Swap, Invitation, ClientTarget, ClientBodyStats, VersionComment, PasswordReset };

let initialised: Sequelize | null = null;

/** Binds every model to one Sequelize instance (models are module-level classes). */
export function initModels(sequelize: Sequelize) {
  if (initialised === sequelize) return;
  initUser(sequelize);
  initRecipes(sequelize);
  initSwap(sequelize);
  initInvitation(sequelize);
  initClientTarget(sequelize);
  initClientBodyStats(sequelize);
  initVersionComment(sequelize);
  initPasswordReset(sequelize);
  initialised = sequelize;
}
