/**
 * `npm test`: a private PostgreSQL for the run (or DATABASE_URL), Chromium for the browser suite,
 * the client built once, then every Vitest project; everything it started is stopped on exit.
 */
import { spawn, execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import pg from 'pg';
import { createBuilder } from 'vite';
import { onExit, startPrivatePostgres } from './postgres';

const isRoot = process.getuid?.() === 0;

function ensureChromium() {
  if (existsSync('/usr/bin/chromium')) return;
  if (!isRoot) throw new Error('Chromium is missing: install Debian package chromium (sudo apt-get install -y chromium).');
  console.log('Installing Debian package chromium for the browser suite…');
  execFileSync('apt-get', ['update'], { stdio: 'inherit' });
  execFileSync('apt-get', ['install', '-y', 'chromium'], { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
}

async function testDatabaseUrl(): Promise<string> {
  const name = 'hearthswap_test';
  let adminUrl: string;
  if (process.env.DATABASE_URL) {
    adminUrl = process.env.DATABASE_URL;
  } else {
    const server = await startPrivatePostgres({
      dataDir: '.data/postgres-test',
      port: Number(process.env.PG_TEST_PORT ?? 54330),
      database: 'postgres',
      durable: false,
    });
    onExit(server.stop);
    adminUrl = server.url;
  }
  const client = new pg.Client({ connectionString: adminUrl });
  client.on('error', () => {}); // a dropped connection fails the query instead of crashing the process
  await client.connect();
  try {
    await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
    await client.query(`CREATE DATABASE "${name}"`);
  } finally {
    await client.end();
  }
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

ensureChromium();
process.env.HEARTHSWAP_TEST_DATABASE_URL = await testDatabaseUrl();
console.log('Building the client for the browser suite…');
// the browser's client and the server-render bundle (vite.config.ts `builder`)
await (await createBuilder({ logLevel: 'warn' })).buildApp();

const args = ['vitest', 'run', ...process.argv.slice(2)];
const child = spawn('npx', args, { stdio: 'inherit', env: { ...process.env, NODE_ENV: 'test' } });
const code: number = await new Promise((resolve) => child.on('exit', (c, signal) => resolve(c ?? (signal ? 1 : 0))));
process.exit(code);
