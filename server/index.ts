/**
 * Serves the API and the built client. Expects a migrated database at DATABASE_URL (see
 * scripts/start.ts, which compiles this file to dist/server/index.js and runs it with node).
 */
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { deploymentWarnings, loadConfig } from './config';
import { keepServingOnStrayRejections, startServer } from './boot';
import { DEMO_ACCOUNTS } from './seeders/demo-accounts';

keepServingOnStrayRejections();
const config = loadConfig(process.env, { clientDir: path.resolve('dist/client'), renderDir: path.resolve('dist/render') });
const running = await startServer(config);
for (const warning of deploymentWarnings(config)) console.warn(`Warning: ${warning}`);
const { port } = running.server.address() as AddressInfo;
console.log(`Hearthswap is serving on http://${config.host}:${port}  (process ${process.pid})`);
if (config.env !== 'production' && process.env.HEARTHSWAP_QUIET !== '1') {
  console.log('Demo sign-in:');
  for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(6)} ${a.email} / ${a.password}`);
}

const shutdown = () => {
  running.close().finally(() => process.exit(0));
};
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
