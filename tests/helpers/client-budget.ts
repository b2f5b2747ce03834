import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import { ROUTE_MODULES } from '../../server/lib/client-shell';

interface ManifestChunk {
  file: string;
  imports?: string[];
  dynamicImports?: string[];
  isEntry?: boolean;
}
type Manifest = Record<string, ManifestChunk>;

export function readManifest(clientDir = path.resolve('dist/client')): Manifest {
  return JSON.parse(readFileSync(path.join(clientDir, '.vite', 'manifest.json'), 'utf8')) as Manifest;
}

/** The JavaScript files a chunk needs before it runs: itself and its static imports, transitively. */
export function staticClosure(manifest: Manifest, key: string, into = new Set<string>()): Set<string> {
  const chunk = manifest[key];
  if (!chunk || into.has(chunk.file)) return into;
  into.add(chunk.file);
  for (const dep of chunk.imports ?? []) staticClosure(manifest, dep, into);
  return into;
}

export interface PageBudget {
  module: string;
  files: string[];
  rawBytes: number;
  gzipBytes: number;
  brotliBytes: number;
}

/**
 * What a first visit of each page downloads as JavaScript: the entry with its imports and the page's
 * route module with its imports. Compressed sizes are those of the build's .gz / .br copies the server
 * sends; a file without one is measured as the compression middleware would send it (gzip level 6,
 * brotli quality 4).
 */
export function firstVisitBudgets(clientDir = path.resolve('dist/client')): PageBudget[] {
  const manifest = readManifest(clientDir);
  const entry = Object.keys(manifest).find((k) => manifest[k].isEntry);
  if (!entry) throw new Error('dist/client/.vite/manifest.json has no entry');
  const sizes = new Map<string, { raw: number; gzip: number; brotli: number }>();
  const size = (file: string) => {
    let s = sizes.get(file);
    if (!s) {
      const full = path.join(clientDir, file);
      const body = readFileSync(full);
      const stored = (ext: string, make: () => Buffer) => (existsSync(`${full}.${ext}`) ? readFileSync(`${full}.${ext}`).length : make().length);
      s = {
        raw: body.length,
        gzip: stored('gz', () => gzipSync(body, { level: 6 })),
        brotli: stored('br', () => brotliCompressSync(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 4 } })),
      };
      sizes.set(file, s);
    }
    return s;
  };
  return [...new Set(ROUTE_MODULES.map(([, module]) => module))].map((module) => {
    const files = [...staticClosure(manifest, `src/app/routes/${module}.tsx`, staticClosure(manifest, entry))];
    const total = files
      .map(size)
      .reduce((acc, s) => ({ raw: acc.raw + s.raw, gzip: acc.gzip + s.gzip, brotli: acc.brotli + s.brotli }), { raw: 0, gzip: 0, brotli: 0 });
    return { module, files, rawBytes: total.raw, gzipBytes: total.gzip, brotliBytes: total.brotli };
  });
}

/** Files that hold the chart library: the chart component's chunk and any chunk it imports that names recharts. */
export function chartFiles(clientDir = path.resolve('dist/client')): string[] {
  const manifest = readManifest(clientDir);
  const key = Object.keys(manifest).find((k) => k.endsWith('before-after-chart.tsx'));
  if (!key) throw new Error('no chart chunk in the manifest');
  const own = manifest[key].file;
  return [...staticClosure(manifest, key)].filter((f) => f === own || readFileSync(path.join(clientDir, f), 'utf8').includes('recharts'));
}
