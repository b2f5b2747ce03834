/**
 * Compiles the server (and the shared code it imports) to plain JavaScript in dist/server, so the
 * serving process runs under `node` without compiling TypeScript at run time. npm packages stay
 * external; the JSON data under data/ is bundled in.
 */
import { build } from 'esbuild';
import path from 'node:path';

export const SERVER_OUT_DIR = path.resolve('dist/server');

export async function buildServer(outdir = SERVER_OUT_DIR) {
  const started = performance.now();
  await build({
    entryPoints: { index: 'server/index.ts', prepare: 'server/prepare.ts', 'workers/rewrite-worker': 'server/workers/rewrite-worker.ts' },
    outdir,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    packages: 'external',
    sourcemap: 'linked',
    logLevel: 'warning',
  });
  return { outdir, ms: performance.now() - started };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const { outdir, ms } = await buildServer();
  console.log(`Server compiled to ${path.relative(process.cwd(), outdir)} in ${ms.toFixed(0)} ms`);
}
