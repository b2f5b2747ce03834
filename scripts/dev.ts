/** `npm run dev`: the database, the API on PORT (restarting on change) and Vite with hot reload in front. */
import { spawn } from 'node:child_process';
import { createServer } from 'vite';
import { resolveDatabaseUrl } from './database-url';
import { loadConfig } from '../server/config';
import { openServices, prepareDatabase } from '../server/boot';

const db = await resolveDatabaseUrl('postgres', Number(process.env.PG_PORT ?? 54329), 'hearthswap');
const config = loadConfig({ ...process.env, DATABASE_URL: db.url });
const services = await openServices(config);
await prepareDatabase(config, services);
await services.close();

const api = spawn('npx', ['tsx', 'watch', 'server/index.ts'], { stdio: 'inherit', env: { ...process.env, DATABASE_URL: db.url } });
const vite = await createServer();
await vite.listen();
vite.printUrls();

const stop = () => {
  api.kill('SIGTERM');
  void vite.close().finally(() => process.exit(0));
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
