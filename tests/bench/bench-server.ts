/**
 * The server as `npm start` runs it, for benchmarks: the development database (private cluster or
 * DATABASE_URL) migrated and seeded, the client built, the server compiled and run with plain node
 * in its own process, so its resident memory is the serving process's alone.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { resolveDatabaseUrl } from '../../scripts/database-url';
import { ensureS3 } from '../../scripts/local-s3';
import { buildServer } from '../../scripts/build-server';
import { startServerProcess } from '../helpers/server-process';

function run(args: string[], env: NodeJS.ProcessEnv) {
  const r = spawnSync(process.execPath, args, { stdio: 'inherit', env });
  if (r.status !== 0) throw new Error(`${args.join(' ')} failed`);
}

/** Resident memory of a process in MB, from /proc. */
export function rssMb(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0);
  return kb / 1024;
}

/** `databaseUrl` when the caller already has the database up; otherwise it is started here and stopped by stop(). */
export async function startBenchServer(extraEnv: NodeJS.ProcessEnv = {}, databaseUrl?: string) {
  const db = databaseUrl ? { url: databaseUrl, stop: () => {} } : await resolveDatabaseUrl('postgres', Number(process.env.PG_PORT ?? 54329), 'hearthswap');
  const s3 = await ensureS3('.data/s3', 0);
  const env = { ...process.env, DATABASE_URL: db.url, NODE_ENV: 'development', ...extraEnv };
  await buildServer();
  run(['dist/server/prepare.js'], env);
  // a production client build whatever NODE_ENV the server runs with
  if (!process.env.SKIP_BUILD) run(['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn'], { ...env, NODE_ENV: 'production' });
  const server = await startServerProcess('dist/server/index.js', env);
  return {
    url: server.url,
    pid: server.pid,
    stop: async () => {
      await server.stop();
      await s3.close();
      db.stop();
    },
  };
}
