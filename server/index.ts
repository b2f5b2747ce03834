/** Serves the API and the built client. Expects a migrated database at DATABASE_URL (see scripts/start.ts). */
import path from 'node:path';
import { deploymentWarnings, loadConfig } from './config';
import { keepServingOnStrayRejections, startServer } from './boot';

keepServingOnStrayRejections();
const config = loadConfig(process.env, { clientDir: path.resolve('dist/client') });
const running = await startServer(config);
for (const warning of deploymentWarnings(config)) console.warn(`Warning: ${warning}`);
console.log(`Hearthswap is serving on http://${config.host}:${config.port}`);

const shutdown = () => {
  running.close().finally(() => process.exit(0));
};
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
