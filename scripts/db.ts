/** `npm run db:migrate` and `npm run db:seed` against DATABASE_URL or the private cluster. */
import { resolveDatabaseUrl } from './database-url';
import { loadConfig } from '../server/config';
import { openServices } from '../server/boot';
import { migrate } from '../server/migrations';
import { seed } from '../server/seeders';

const command = process.argv[2];
const db = await resolveDatabaseUrl('postgres', Number(process.env.PG_PORT ?? 54329), 'hearthswap');
const config = loadConfig({ ...process.env, DATABASE_URL: db.url });
const services = await openServices(config);
try {
  if (command === 'migrate') {
    const applied = await migrate(services.sequelize);
    console.log(`Applied ${applied.length} migration(s).`);
  } else if (command === 'seed') {
    await migrate(services.sequelize);
    console.log('Seeded:', await seed(services.sequelize, { demo: config.env !== 'production' }));
  } else {
    console.error('usage: tsx scripts/db.ts migrate|seed');
    process.exitCode = 2;
  }
} finally {
  await services.close();
  db.stop();
}
