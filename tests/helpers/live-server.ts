import { inject } from 'vitest';
import { randomUUID } from 'node:crypto';
import path from 'node:path';
import { existsSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { loadConfig } from '../../server/config';
import { startServer } from '../../server/boot';

/** The real server with the built client on a free loopback port. */
export async function startLiveServer() {
  const clientDir = path.resolve('dist/client');
  if (!existsSync(path.join(clientDir, 'index.html'))) {
    throw new Error('dist/client is missing: run `npm run build` first (npm test does it for you).');
  }
  const config = loadConfig(
    { NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), ...inject('s3Env') },
    { clientDir, renderDir: path.resolve('dist/render'), port: 0, host: '127.0.0.1' },
  );
  config.limits = { ...config.limits, loginFailuresPer15Min: 1000, signupsPerHour: 1000, scope: `test-${randomUUID()}` };
  const running = await startServer(config);
  const { port } = running.server.address() as AddressInfo;
  return { url: `http://127.0.0.1:${port}`, outbox: () => [...(running.mail.smtp?.messages ?? [])], close: running.close };
}
