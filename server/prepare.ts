/** Migrates and seeds the database at DATABASE_URL, then exits (run by `npm start` before serving). */
import { loadConfig } from './config';
import { openServices, prepareDatabase } from './boot';

const config = loadConfig(process.env);
const services = await openServices(config);
try {
  const report = await prepareDatabase(config, services);
  console.log(`Database migrated; seeded: ${JSON.stringify(report)}`);
} finally {
  await services.close();
}
