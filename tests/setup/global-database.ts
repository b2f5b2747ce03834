/**
 * Vitest global setup for the API and browser suites: a real PostgreSQL (DATABASE_URL from `npm test`,
 * or a private cluster when vitest runs alone), a fresh test database, migrated and seeded once.
 */
import type { TestProject } from 'vitest/node';
import pg from 'pg';
import { startPrivatePostgres } from '../../scripts/postgres';
import { loadConfig } from '../../server/config';
import { openServices, prepareDatabase } from '../../server/boot';
import { ensureS3 } from '../../scripts/local-s3';

export default async function setup(project: TestProject) {
  let stop = () => {};
  let url = process.env.HEARTHSWAP_TEST_DATABASE_URL;
  if (!url) {
    const server = await startPrivatePostgres({
      dataDir: '.data/postgres-test',
      port: Number(process.env.PG_TEST_PORT ?? 54330),
      database: 'postgres',
      durable: false,
    });
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
  const s3 = await ensureS3('.data/s3-test', 0);
  project.provide('s3Env', {
    S3_ENDPOINT: process.env.S3_ENDPOINT ?? '',
    S3_BUCKET: process.env.S3_BUCKET ?? '',
    S3_REGION: process.env.S3_REGION ?? '',
    S3_ACCESS_KEY_ID: process.env.S3_ACCESS_KEY_ID ?? '',
    S3_SECRET_ACCESS_KEY: process.env.S3_SECRET_ACCESS_KEY ?? '',
  });
  return async () => {
    await s3.close();
    stop();
  };
}

async function recreateDatabase(adminUrl: string, name: string) {
  const client = new pg.Client({ connectionString: adminUrl });
  client.on('error', () => {}); // a dropped connection fails the query instead of crashing the process
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
    s3Env: Record<string, string>;
  }
}
