/**
 * Vitest global setup for the API and browser suites: a real PostgreSQL (DATABASE_URL from `npm test`,
 * or a private cluster when vitest runs alone), a fresh test database, migrated and seeded once.
 */
import type { TestProject } from 'vitest/node';
import pg from 'pg';
import { startPrivatePostgres } from '../../scripts/postgres';
import { loadConfig } from '../../server/config';
import { openServices, prepareDatabase } from '../../server/boot';

export default async function setup(project: TestProject) {
  let stop = () => {};
  let url = process.env.HEARTHSWAP_TEST_DATABASE_URL;
  if (!url) {
    const server = await startPrivatePostgres({ dataDir: '.data/postgres-test', port: 54330, database: 'postgres' });
    stop = server.stop;
    url = server.url.replace(/\/postgres$/, '/hearthswap_test');
    await recreateDatabase(server.url, 'hearthswap_test');
    process.env.HEARTHSWAP_TEST_DATABASE_URL = url;
  }
  const config = loadConfig({ NODE_ENV: 'test', DATABASE_URL: url });
  const services = await openServices(config);
  await prepareDatabase(config, services);
  await services.close();
  project.provide('databaseUrl', url);
  return () => stop();
}

async function recreateDatabase(adminUrl: string, name: string) {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
    await client.query(`CREATE DATABASE "${name}"`);
  } finally {
    await client.end();
  }
}

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}
