import { onExit, startPrivatePostgres } from './postgres';

/**
 * DATABASE_URL when set; otherwise a private cluster in `.data/<name>` that stops when this process exits.
 */
export async function resolveDatabaseUrl(name: 'postgres' | 'postgres-test', port: number, database: string) {
  if (process.env.DATABASE_URL) return { url: process.env.DATABASE_URL, stop: () => {}, private: false };
  const pgServer = await startPrivatePostgres({ dataDir: `.data/${name}`, port, database, durable: name === 'postgres' });
  onExit(pgServer.stop);
  return { url: pgServer.url, stop: pgServer.stop, private: true };
}
