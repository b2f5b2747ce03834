import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { brotliCompressSync } from 'node:zlib';
import { createTestApp, type TestApp } from '../helpers/test-app';

// A client folder shaped like Vite's output (hashed files under assets/, the manifest in .vite/),
// so these checks do not depend on a client build.
const ENTRY = 'assets/index-AbCd1234.js';
const PAGE = 'assets/recipe-book-EfGh5678.js';
const SHARED = 'assets/format-IjKl9012.js';
const BIG_SCRIPT = `export const words = ${JSON.stringify('Hearthswap keeps the plate full. '.repeat(2000))};\n`;

const PRECOMPRESSED = brotliCompressSync(Buffer.from(BIG_SCRIPT));

let dir: string;
let t: TestApp;

beforeAll(async () => {
  dir = await mkdtemp(path.join(os.tmpdir(), 'hearthswap-client-'));
  await mkdir(path.join(dir, 'assets'));
  await mkdir(path.join(dir, '.vite'));
  await writeFile(
    path.join(dir, 'index.html'),
    `<!doctype html><html><head><script type="module" crossorigin src="/${ENTRY}"></script></head><body><div id="root"></div></body></html>`,
  );
  for (const file of [ENTRY, PAGE, SHARED]) await writeFile(path.join(dir, file), BIG_SCRIPT);
  // the build's precompressed copy (vite-plugin-compression2); PAGE and SHARED have none
  await writeFile(path.join(dir, `${ENTRY}.br`), PRECOMPRESSED);
  await writeFile(
    path.join(dir, '.vite', 'manifest.json'),
    JSON.stringify({
      'index.html': { file: ENTRY, isEntry: true, imports: [] },
      'src/app/routes/recipe-book.tsx': { file: PAGE, isDynamicEntry: true, imports: ['_format.js'] },
      '_format.js': { file: SHARED },
    }),
  );
  t = await createTestApp({}, { config: { clientDir: dir } });
});

afterAll(async () => {
  await t.close();
  await rm(dir, { recursive: true, force: true });
});

describe('serving the client', () => {
  it('caches hashed assets as immutable for a year and compresses them', async () => {
    const res = await request(t.app).get(`/${PAGE}`).set('Accept-Encoding', 'gzip').expect(200);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.text).toBe(BIG_SCRIPT); // supertest inflates it again
  });

  it('sends the build’s brotli copy as it is when the browser offers brotli', async () => {
    const res = await request(t.app)
      .get(`/${ENTRY}`)
      .set('Accept-Encoding', 'br, gzip')
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    // the length of the stored .br file, not a stream compressed on the fly (which is chunked)
    expect(res.headers['content-length']).toBe(String(PRECOMPRESSED.length));
    expect((res.body as Buffer).toString()).toBe(BIG_SCRIPT); // supertest inflates it
  });

  it('serves index.html for every page with private, no-cache, preloading that page’s chunks', async () => {
    const book = await request(t.app).get('/recipes').expect(200);
    expect(book.headers['cache-control']).toBe('private, no-cache');
    expect(book.headers['content-type']).toMatch(/text\/html/);
    expect(book.text).toContain(`<link rel="modulepreload" fetchpriority="low" crossorigin href="/${PAGE}">`);
    expect(book.text).toContain(`<link rel="modulepreload" fetchpriority="low" crossorigin href="/${SHARED}">`);
    const unknown = await request(t.app).get('/no-such-page').expect(200);
    expect(unknown.headers['cache-control']).toBe('private, no-cache');
    expect(unknown.text).not.toContain('modulepreload');
  });

  it('answers a missing hashed asset with 404, not with index.html', async () => {
    const res = await request(t.app).get('/assets/kitchen-OldHash1.js').expect(404);
    expect(res.text).not.toContain('<div id="root">');
  });

  it('compresses JSON answers too, and leaves small ones alone', async () => {
    const big = await request(t.app).get('/api/foods/search').query({ q: 'cheese', limit: 50 }).set('Accept-Encoding', 'gzip').expect(200);
    expect(big.headers['content-encoding']).toBe('gzip');
    const small = await request(t.app).get('/api/health').set('Accept-Encoding', 'gzip').expect(200);
    expect(small.headers['content-encoding']).toBeUndefined();
  });

  it('compresses an analysis in one piece: gzip or brotli as offered, the same JSON as sent plain, and plain when nothing is offered', async () => {
    const recipe = {
      text: ['12 oz elbow macaroni', '2 cups shredded sharp cheddar', '2 1/2 cups whole milk', '3 tbsp butter', '1 lb ground beef'].join('\n'),
      servings: 4,
    };
    const plain = await request(t.app).post('/api/analyze').set('Accept-Encoding', 'identity').send(recipe).expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    const length = Number(plain.headers['content-length']);
    expect(length).toBeGreaterThan(1024);
    for (const offered of ['gzip, deflate', 'br', 'gzip, deflate, br']) {
      const res = await request(t.app).post('/api/analyze').set('Accept-Encoding', offered).send(recipe).expect(200);
      expect(res.headers['content-encoding'], offered).toBe(offered === 'br' ? 'br' : 'gzip');
      expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
      expect(res.headers.vary).toMatch(/Accept-Encoding/);
      // a length, not a chunked stream: compressed in one call, and well under the plain answer
      expect(Number(res.headers['content-length'])).toBeLessThan(length / 2);
      expect(res.body).toEqual(plain.body); // supertest decodes it
    }
    const none = await request(t.app).post('/api/analyze').unset('Accept-Encoding').send(recipe).expect(200);
    expect(none.headers['content-encoding']).toBeUndefined();
    expect(none.body).toEqual(plain.body);
  });
});
