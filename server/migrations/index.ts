import type { Sequelize } from 'sequelize';
import { Umzug, SequelizeStorage } from 'umzug';
import * as m0001 from './0001-users-and-sessions';
import * as m0002 from './0002-catalogue';
import * as m0003 from './0003-recipes';
import * as m0004 from './0004-coaching';
import * as m0005 from './0005-shared-process-state';
import * as m0006 from './0006-my-foods';
import * as m0007 from './0007-coach-paths';

/** Every migration in order; add new ones at the end and never edit one that has shipped. */
const MIGRATIONS = [
  { name: '0001-users-and-sessions', ...m0001 },
  { name: '0002-catalogue', ...m0002 },
  { name: '0003-recipes', ...m0003 },
  { name: '0004-coaching', ...m0004 },
  { name: '0005-shared-process-state', ...m0005 },
  { name: '0006-my-foods', ...m0006 },
  { name: '0007-coach-paths', ...m0007 },
];

export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: MIGRATIONS.map(({ name, up, down }) => ({ name, up, down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrate(sequelize: Sequelize) {
  return createMigrator(sequelize).up();
}
