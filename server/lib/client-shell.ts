import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { PAGE_STATE_ID, type RenderedPage } from '../../shared/page-render';

/**
 * Which client route module each page path loads (src/app/router.tsx). index.html gets
 * `<link rel="modulepreload">` for that module and its imports, so the browser fetches the page's
 * code in parallel with the entry instead of discovering it chunk by chunk after the entry ran.
 * tests/unit/route-preloads.test.ts checks that every lazy route in the router is listed here.
 */
export const ROUTE_MODULES: readonly [pattern: string, module: string][] = [
  ['/', 'kitchen'],
  ['/foods', 'foods'],
  ['/foods/:id', 'food-detail'],
  ['/my-foods', 'my-foods'],
  ['/sign-in', 'sign-in'],
  ['/sign-up', 'sign-up'],
  ['/forgot-password', 'forgot-password'],
  ['/reset-password/:token', 'reset-password'],
  ['/invitations/:token', 'invitation'],
  ['/account', 'account'],
  ['/recipes/:id/versions/:number/prep', 'prep'],
  ['/recipes', 'recipe-book'],
  ['/recipes/:id', 'recipe-detail'],
  ['/recipes/:id/compare', 'recipe-compare'],
  ['/recipes/:id/print', 'recipe-print'],
  ['/shopping', 'shopping-list'],
  ['/coach', 'my-coach'],
  ['/swaps', 'swap-library'],
  ['/clients', 'clients'],
  ['/clients/:id', 'client-detail'],
  ['/clients/:id/versions/:recipeId/:number', 'client-version'],
  ['/admin/users', 'people'],
  ['/admin/outbox', 'outbox'],
];

interface ManifestChunk {
  file: string;
  imports?: string[];
  css?: string[];
  isEntry?: boolean;
}
type Manifest = Record<string, ManifestChunk>;

function segments(p: string) {
  return p.split('/').filter(Boolean);
}

export function routeModuleFor(pathname: string): string | null {
  const parts = segments(pathname);
  for (const [pattern, module] of ROUTE_MODULES) {
    const want = segments(pattern);
    if (want.length === parts.length && want.every((w, i) => w.startsWith(':') || w === parts[i])) return module;
  }
  return null;
}

/** Every file a manifest chunk needs, itself first, its static imports after (depth first, once). */
function chunkFiles(manifest: Manifest, key: string, seen = new Set<string>()): { js: string[]; css: string[] } {
  const out = { js: [] as string[], css: [] as string[] };
  if (seen.has(key) || !manifest[key]) return out;
  seen.add(key);
  const chunk = manifest[key];
  out.js.push(chunk.file);
  out.css.push(...(chunk.css ?? []));
  for (const dep of chunk.imports ?? []) {
    const sub = chunkFiles(manifest, dep, seen);
    out.js.push(...sub.js);
    out.css.push(...sub.css);
  }
  return out;
}

/**
 * The style sheets first in the head, before Vite's entry script: they are what the first paint of a
 * server-drawn page waits for, so they go out ahead of the scripts on the browser's few connections.
 */
export function stylesFirst(html: string): string {
  const sheets = html.match(/<link rel="stylesheet"[^>]*>\s*/g);
  if (!sheets) return html;
  let rest = html;
  for (const sheet of sheets) rest = rest.replace(sheet, '');
  return rest.replace(/(<meta charset="[^"]*"\s*\/?>\s*)/i, (meta) => `${meta}${sheets.map((s) => s.trim()).join('\n    ')}\n    `);
}

/**
 * The entry's style sheets written into the head as <style>: a fresh visit paints the server's page as
 * soon as the HTML is parsed, instead of waiting for a second request that queues behind the page's
 * scripts on the browser's few connections (it took 150–400 ms of a first visit on a loaded machine).
 * The whole sheet is small (Tailwind keeps only the classes the code uses: about 9 KB compressed), and
 * only the first page of a visit carries it: later pages are drawn in the browser.
 */
export function inlineStyles(html: string, clientDir: string): string {
  return html.replace(/<link rel="stylesheet"[^>]*href="\/(assets\/[^"]+\.css)"[^>]*>/g, (link, file: string) => {
    const full = path.join(clientDir, file);
    if (!existsSync(full)) return link;
    const css = readFileSync(full, 'utf8');
    // a sheet that could end the element early stays a link
    return /<\/style/i.test(css) ? link : `<style>${css}</style>`;
  });
}

/** Font weights drawn on the first screen of a page (headings, body, buttons), unless FIRST_SCREEN_WEIGHTS_OF lists the page. */
export const FIRST_SCREEN_WEIGHTS = [400, 700, 800, 900];

/**
 * Pages whose first screen draws other weights: the book's column heads and sort labels are semibold
 * (600) and nothing on it is 800. A face the first screen draws but the page did not preload is drawn
 * in Chromium's fallback face until it arrives, and every fallback size and weight costs the renderer a
 * synchronous round trip to the browser for the system font's settings (about 10 ms each on a loaded
 * machine: the largest part of a fresh visit's first layout, tests/bench/first-visit-trace.ts).
 */
export const FIRST_SCREEN_WEIGHTS_OF: Readonly<Record<string, readonly number[]>> = {
  'recipe-book': [400, 600, 700, 900],
};

/**
 * `<link rel="preload">` for the woff2 faces of `weights` named in the style sheets of `html`: the
 * browser fetches them while it parses, not after its first style pass found them, so the first paint
 * is more often in Nunito than in the fallback face (no swap a moment later).
 */
export function preloadFonts(html: string, weights: readonly number[]): string {
  const faces = html.match(/@font-face\s*\{[^}]*\}/g) ?? [];
  const files = faces.flatMap((face) => {
    const weight = Number(/font-weight:\s*(\d+)/.exec(face)?.[1]);
    const woff2 = /url\(["']?(\/assets\/[^)"']+\.woff2)["']?\)/.exec(face)?.[1];
    return woff2 && weights.includes(weight) ? [woff2] : [];
  });
  if (!files.length) return html;
  const links = [...new Set(files)].map((f) => `<link rel="preload" as="font" type="font/woff2" crossorigin href="${f}">`);
  return html.replace(/(<meta charset="[^"]*"\s*\/?>\s*)/i, (meta) => `${meta}${links.join('\n    ')}\n    `);
}

/**
 * The app's scripts fetched after the first screen's fonts: `fetchpriority="low"` on the entry and its
 * module preloads. Chromium holds low-priority requests back while the page's high-priority ones (the
 * preloaded faces) are in flight, so the faces reach the first layout rather than the fallback face;
 * the scripts run only after that paint anyway (src/main.tsx).
 */
export function scriptsAfterFonts(html: string): string {
  return html
    .replace(/<script type="module" crossorigin/g, '<script type="module" fetchpriority="low" crossorigin')
    .replace(/<link rel="modulepreload"/g, '<link rel="modulepreload" fetchpriority="low"');
}

/**
 * The built index.html with per-page preloads: the page's route module with its imports, less what
 * the entry already loads. Without Vite's manifest (an older build) every page gets the plain index.html.
 */
export function createClientShell(clientDir: string) {
  const styledHtml = scriptsAfterFonts(inlineStyles(stylesFirst(readFileSync(path.join(clientDir, 'index.html'), 'utf8')), clientDir));
  const manifestFile = path.join(clientDir, '.vite', 'manifest.json');
  const manifest: Manifest | null = existsSync(manifestFile) ? (JSON.parse(readFileSync(manifestFile, 'utf8')) as Manifest) : null;
  const entryKey = manifest ? Object.keys(manifest).find((k) => manifest[k].isEntry) : undefined;
  const entryFiles = manifest && entryKey ? chunkFiles(manifest, entryKey) : { js: [], css: [] };
  const inEntry = new Set([...entryFiles.js, ...entryFiles.css]);
  const pages = new Map<string | null, { html: string; preloads: string[] }>();

  function pageFor(module: string | null) {
    const cached = pages.get(module);
    if (cached) return cached;
    const key = `src/app/routes/${module}.tsx`;
    const { js, css } = module && manifest?.[key] ? chunkFiles(manifest, key) : { js: [], css: [] };
    const preloads = [...new Set(js)].filter((f) => !inEntry.has(f));
    const links = [
      ...[...new Set(css)].filter((f) => !inEntry.has(f)).map((f) => `<link rel="stylesheet" crossorigin href="/${f}">`),
      ...preloads.map((f) => `<link rel="modulepreload" fetchpriority="low" crossorigin href="/${f}">`),
    ];
    const indexHtml = preloadFonts(styledHtml, (module ? FIRST_SCREEN_WEIGHTS_OF[module] : undefined) ?? FIRST_SCREEN_WEIGHTS);
    const page = { html: links.length ? indexHtml.replace('</head>', `    ${links.join('\n    ')}\n  </head>`) : indexHtml, preloads };
    pages.set(module, page);
    return page;
  }

  return {
    /** index.html for a page path, preloading that page's code */
    html(pathname: string): string {
      return pageFor(routeModuleFor(pathname)).html;
    },
    preloads(pathname: string): string[] {
      return pageFor(routeModuleFor(pathname)).preloads;
    },
  };
}

/**
 * index.html with the page in #root, its title in the head and the state script after #root
 * (a JSON script: nothing runs, so the Content-Security-Policy's script-src stays 'self').
 */
export function fillShell(shell: string, page: RenderedPage): string {
  let html = page.html ?? '';
  let head = shell;
  // React writes a page's <title> first; it belongs in the head
  const title = /^<title>[^<]*<\/title>/.exec(html)?.[0];
  if (title) {
    html = html.slice(title.length);
    head = head.replace(/<title>[^<]*<\/title>/, () => title);
  }
  // a function, so a "$&" in a recipe's title is not a replacement pattern
  return head.replace(
    '<div id="root"></div>',
    () => `<div id="root">${html}</div><script type="application/json" id="${PAGE_STATE_ID}">${page.state}</script>`,
  );
}
