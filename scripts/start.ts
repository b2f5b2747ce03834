/**
 * `npm start`: database up (a private cluster unless DATABASE_URL is set), photo store up, then in
 * separate processes: migrate + seed, build the client (Vite) and compile the server (esbuild), and
 * finally serve with plain `node dist/server/index.js`. The serving process compiles nothing and
 * holds no build tools. Ctrl-C stops everything, the database included.
 */
import { spawn } from 'node:child_process';
import { resolveDatabaseUrl } from './database-url';
import { ensureS3 } from './local-s3';
import { buildServer } from './build-server';

const started = Date.now();
const db = await resolveDatabaseUrl('postgres', Number(process.env.PG_PORT ?? 54329), 'hearthswap');
process.env.DATABASE_URL = db.url;
const s3 = await ensureS3('.data/s3', Number(process.env.S3_LOCAL_PORT ?? 0));
console.log(`Database ready (${db.private ? 'private cluster in .data/postgres' : 'DATABASE_URL'})`);

function run(command: string, args: string[], env: NodeJS.ProcessEnv = process.env) {
  return new Promise<void>((resolve, reject) => {
    const child = spawn(command, args, { stdio: 'inherit', env });
    child.on('error', reject);
    child.on('exit', (code, signal) => (code === 0 ? resolve() : reject(new Error(`${command} ${args.join(' ')} ended with ${signal ?? `code ${code}`}`))));
  });
}

async function stopAll(code: number) {
  await s3.close().catch(() => {});
  db.stop();
  process.exit(code);
}

try {
  const server = await buildServer();
  console.log(`Server compiled to dist/server in ${server.ms.toFixed(0)} ms`);
  const client = process.env.SKIP_BUILD
    ? Promise.resolve()
    : (console.log('Building the client…'),
      run(process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn'], { ...process.env, NODE_ENV: 'production' }));
  await Promise.all([run(process.execPath, ['dist/server/prepare.js']), client]);
} catch (error) {
  console.error(String(error));
  await stopAll(1);
}

let stopping = false;
let serving = serve();
const restarts: number[] = [];
console.log(`Serving process ${serving.pid} started ${((Date.now() - started) / 1000).toFixed(1)} s after npm start. Press Ctrl-C to stop.`);

/** The serving process; should it ever die on its own it is started again (at most 5 times a minute). */
function serve() {
  const child = spawn(process.execPath, ['dist/server/index.js'], { stdio: 'inherit', env: process.env });
  child.on('exit', (code, signal) => {
    const now = Date.now();
    restarts.push(now);
    while (restarts.length && restarts[0] < now - 60_000) restarts.shift();
    if (stopping || restarts.length > 5) return void stopAll(code ?? 0);
    console.error(`The serving process ended (${signal ?? `code ${code}`}); starting it again.`);
    setTimeout(() => {
      serving = serve();
    }, 1_000);
  });
  return child;
}

const stop = (signal: NodeJS.Signals) => () => {
  stopping = true;
  if (serving.exitCode === null && serving.signalCode === null) serving.kill(signal);
  else void stopAll(0);
};
process.on('SIGINT', stop('SIGINT'));
process.on('SIGTERM', stop('SIGTERM'));
