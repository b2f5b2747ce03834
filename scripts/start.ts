/** `npm start`: database up, migrate, seed, build the client, serve API and client from one process. */
import path from 'node:path';
import { build } from 'vite';
import { resolveDatabaseUrl } from './database-url';
import { ensureS3 } from './local-s3';
import { deploymentWarnings, loadConfig } from '../server/config';
import { keepServingOnStrayRejections, openServices, prepareDatabase } from '../server/boot';
import { createApp } from '../server/app';
import { DEMO_ACCOUNTS } from '../server/seeders/demo-accounts';
import { getFoodEngine } from '../server/services/food-engine';
import { createMailContext } from '../server/mail-context';

const started = Date.now();
keepServingOnStrayRejections();
const db = await resolveDatabaseUrl('postgres', Number(process.env.PG_PORT ?? 54329), 'hearthswap');
process.env.DATABASE_URL = db.url;
const s3 = await ensureS3('.data/s3', Number(process.env.S3_LOCAL_PORT ?? 0));
const config = loadConfig(process.env, { clientDir: path.resolve('dist/client') });
for (const warning of deploymentWarnings(config)) console.warn(`Warning: ${warning}`);

const services = await openServices(config);
const report = await prepareDatabase(config, services);
console.log(`Database ready (${db.private ? 'private cluster in .data/postgres' : 'DATABASE_URL'}); seeded: ${JSON.stringify(report)}`);

if (!process.env.SKIP_BUILD) {
  console.log('Building the client…');
  await build({ logLevel: 'warn' });
}

const engine = await getFoodEngine(services.sequelize);
console.log(`Catalogue loaded: ${engine.foods.length} foods, indexes built in ${engine.builtMs.toFixed(0)} ms`);
const mail = await createMailContext(config);
const app = createApp({ config, ...services, mail: mail.mail });
const server = app.listen(config.port, config.host, () => {
  console.log(`\nHearthswap is serving on http://${config.host}:${config.port}  (ready in ${((Date.now() - started) / 1000).toFixed(1)} s)`);
  if (config.env !== 'production') {
    console.log('Demo sign-in:');
    for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(6)} ${a.email} / ${a.password}`);
  }
  console.log('Press Ctrl-C to stop.');
});

const shutdown = () => {
  server.close();
  Promise.allSettled([services.close(), s3.close(), mail.close()]).finally(() => process.exit(0));
};
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
