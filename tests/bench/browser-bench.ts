/**
 * First visit of the Kitchen and the recipe book on a phone profile in Chromium, with an empty cache:
 * time from navigation to content on screen, and the JavaScript it downloaded (bytes on the wire,
 * compressed). Prints figures; asserts nothing. Goals (issue 13/14): ≤ 500 ms on loopback, ≤ 200 KB.
 *
 * "Content" is when the page's main content — the Kitchen's heading, the book's first recipe title —
 * was painted, as the browser itself reports it (Element Timing, renderTime from the navigation's
 * start). Both pages are drawn on the server, so that content arrives in the HTML: a script added
 * before the page loads marks the element as the parser inserts it, and the figure counts only when
 * the element came from the server's HTML and is still the one on screen after the app hydrated (a
 * page the app redrew would show a new element, and the visit is reported as not counted).
 * "Ready" is when Playwright finds that content visible: its checks run on the page's main thread, so
 * they wait while the app's code hydrates — when the page answers a tap, not when the cook sees it.
 * "LCP" is the browser's largest contentful paint of the same visit.
 *
 * All times count from the navigation's start (the page's timeOrigin; the new context and page are made
 * before it). A fresh context gets a new renderer process: the browser has the server's HTML at
 * `responseEnd` but the renderer creates the document only later (`documentMs`, when scripts added
 * before the page run). That wait is the browser's own start-up, which no page can shorten; "page"
 * figures leave it out (content − max(0, document − responseEnd)), "full" figures keep it.
 *
 * The "floor" row is the same visit of a static page holding only the heading (no style sheet, font or
 * script, from a bare node:http server): what the harness and the browser cost before any page work.
 * Each new context is a new desktop window, whose omnibox popup Chromium builds as a WebUI page in a
 * renderer of its own (about as much CPU as the visited page, at the same moment; no phone browser
 * does this): it is turned off (WINDOW_UI_FEATURES) unless BROWSER_UI=1. Figures from before that
 * change (issue 14's first ones) include it. tests/bench/first-visit-trace.ts breaks one visit down.
 */
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Browser, BrowserContext, Page, Request } from 'playwright-core';
import { launchBrowser } from '../helpers/browser';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';
import { percentile } from './server-bench';
import { machineLoad } from './load-bench';

const PHONE = {
  viewport: { width: 390, height: 844 },
  isMobile: true,
  hasTouch: true,
  userAgent: 'Mozilla/5.0 (Linux; Android 14; Pixel 8) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/120.0 Mobile Safari/537.36',
};

/** The element that says the page's content is on screen: the first `selector` whose own text is `text`. */
interface ContentMark {
  selector: string;
  text: string;
}

interface Visit {
  /** when the server-drawn content was painted (Element Timing), null when it was not the server's */
  contentMs: number | null;
  /** when the browser had the whole HTML (Navigation Timing responseEnd) */
  htmlMs: number;
  /** when the renderer created the document (scripts added before the page ran) */
  documentMs: number;
  /** when Playwright's visibility check passed */
  readyMs: number;
  /** largest contentful paint, from the navigation's start */
  paintedMs: number;
  jsBytes: number;
  jsFiles: number;
  encodings: Set<string>;
}

/**
 * Runs in the page before its HTML: gives the content element `elementtiming` as soon as the parser
 * inserts it (before any paint), noting whether the HTML parser was still reading the server's page.
 */
function markContent(mark: ContentMark) {
  const w = window as unknown as { __content?: { element: Element; fromServer: boolean }; __documentMs?: number };
  w.__documentMs = performance.now();
  const observer = new MutationObserver(() => {
    if (w.__content) return;
    // the element holding the text itself: Element Timing reports text by the element of its text node
    const element = [...document.querySelectorAll(mark.selector)].find((e) =>
      [...e.childNodes].some((n) => n.nodeType === Node.TEXT_NODE && n.textContent?.trim() === mark.text),
    );
    if (!element) return;
    element.setAttribute('elementtiming', 'content');
    w.__content = { element, fromServer: document.readyState === 'loading' };
    observer.disconnect();
  });
  observer.observe(document, { childList: true, subtree: true });
}

/** The content's paint time, when it came from the server's HTML and hydration kept it. */
function contentPaint(): Promise<number | null> {
  const w = window as unknown as { __content?: { element: Element; fromServer: boolean } };
  const content = w.__content;
  if (!content?.fromServer || !content.element.isConnected) return Promise.resolve(null);
  return new Promise((resolve) => {
    new PerformanceObserver((list) => {
      const entry = list.getEntries().find((e) => (e as PerformanceEntry & { identifier: string }).identifier === 'content') as
        (PerformanceEntry & { renderTime: number }) | undefined;
      resolve(entry ? entry.renderTime : null);
    }).observe({ type: 'element', buffered: true });
    setTimeout(() => resolve(null), 2000);
  });
}

async function firstVisit(
  browser: Browser,
  deviceScaleFactor: number,
  url: string,
  content: ContentMark,
  ready: (page: Page) => Promise<void>,
  prepare?: (context: BrowserContext) => Promise<void>,
): Promise<Visit> {
  const context = await browser.newContext({ ...PHONE, deviceScaleFactor });
  try {
    if (prepare) await prepare(context);
    const page = await context.newPage();
    await page.addInitScript(markContent, content);
    const scripts: Promise<{ bytes: number; encoding: string }>[] = [];
    const onFinished = (request: Request) => {
      if (request.resourceType() !== 'script') return;
      scripts.push(
        Promise.all([request.sizes(), request.response()]).then(([sizes, response]) => ({
          bytes: sizes.responseBodySize,
          encoding: response?.headers()['content-encoding'] ?? 'identity',
        })),
      );
    };
    page.on('requestfinished', onFinished);
    const t0 = performance.now();
    await page.goto(url, { waitUntil: 'commit' });
    await ready(page);
    const readyMs = performance.now() - t0;
    await page.waitForLoadState('networkidle');
    const contentMs = await page.evaluate(contentPaint);
    const paintedMs = await page.evaluate(
      () =>
        new Promise<number>((resolve) => {
          new PerformanceObserver((list) => resolve(list.getEntries().at(-1)!.startTime)).observe({ type: 'largest-contentful-paint', buffered: true });
        }),
    );
    const { htmlMs, documentMs } = await page.evaluate(() => ({
      htmlMs: (performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming).responseEnd,
      documentMs: (window as unknown as { __documentMs: number }).__documentMs,
    }));
    // counted once the page is idle: a script finishing while the context closes would have no sizes to read
    page.off('requestfinished', onFinished);
    const done = await Promise.all(scripts);
    return {
      contentMs,
      htmlMs,
      documentMs,
      readyMs,
      paintedMs,
      jsBytes: done.reduce((s, d) => s + d.bytes, 0),
      jsFiles: done.length,
      encodings: new Set(done.map((d) => d.encoding)),
    };
  } finally {
    await context.close();
  }
}

/**
 * Desktop Chromium builds the omnibox popup of every new window as a WebUI page in a renderer of its
 * own: ~170 modules, as much CPU as the visited page, at the same moment (a phone's browser has no such
 * window). Every visit here opens a new window, so it is turned off unless BROWSER_UI=1.
 */
export const WINDOW_UI_FEATURES = ['WebUIOmniboxPopup', 'WebUIOmniboxAimPopup', 'WebUIOmniboxFullPopup', 'WebUIOmniboxFrame'];

/**
 * The floor: a static page with only the heading, no style sheet, font or script, from a bare
 * node:http server. Its first paint is what the harness and the browser cost on their own.
 */
export const FLOOR_HTML =
  '<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Floor</title></head><body><h1>Kitchen</h1></body></html>';

async function startFloorServer() {
  const server = createServer((_req, res) => res.writeHead(200, { 'Content-Type': 'text/html; charset=utf-8' }).end(FLOOR_HTML));
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return { url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/`, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

function figures(values: number[]) {
  return `p50 ${percentile(values, 50).toFixed(0)} ms, p95 ${percentile(values, 95).toFixed(0)} ms`;
}

export async function runBrowserBench(baseUrl: string, rounds = Number(process.env.BROWSER_ROUNDS ?? 9)) {
  const browser = await launchBrowser({ disableFeatures: process.env.BROWSER_UI ? [] : WINDOW_UI_FEATURES });
  const floor = await startFloorServer();
  const cook = DEMO_ACCOUNTS.find((a) => a.role === 'cook')!;
  const signIn = async (context: BrowserContext) => {
    const csrf = (await (await context.request.get(`${baseUrl}/api/auth/csrf`)).json()) as { token: string };
    const res = await context.request.post(`${baseUrl}/api/auth/login`, {
      headers: { 'X-CSRF-Token': csrf.token },
      data: { email: cook.email, password: cook.password },
    });
    if (!res.ok()) throw new Error(`demo sign-in failed: ${res.status()}`);
  };
  const recipeTitle = 'Weeknight baked ziti';
  const pages: [string, string, ContentMark, (page: Page) => Promise<void>, ((c: BrowserContext) => Promise<void>)?][] = [
    [
      'floor (static heading, no CSS/font/JS)',
      floor.url,
      { selector: 'h1', text: 'Kitchen' },
      (page) => page.getByRole('heading', { name: 'Kitchen', level: 1 }).waitFor(),
    ],
    ['Kitchen (signed out)', '/', { selector: 'h1', text: 'Kitchen' }, (page) => page.getByRole('heading', { name: 'Kitchen', level: 1 }).waitFor()],
    [
      'Recipe book (demo cook)',
      '/recipes',
      { selector: 'main a', text: recipeTitle },
      (page) => page.getByText(recipeTitle).filter({ visible: true }).first().waitFor(),
      signIn,
    ],
  ];
  // BROWSER_DPR: the device pixel ratios to visit at, e.g. "3" (the phone's own) or "3,1"
  const ratios = (process.env.BROWSER_DPR ?? '3,1').split(',').map(Number);
  try {
    await firstVisit(browser, 3, `${baseUrl}/`, pages[1][2], pages[1][3]); // warm the server, not the browser
    for (const dpr of ratios) {
      // the pages take turns, so a change in the machine's load falls on both alike
      const visits: Visit[][] = pages.map(() => []);
      for (let i = 0; i < rounds; i++) {
        for (const [p, [, path, content, ready, prepare]] of pages.entries())
          visits[p].push(await firstVisit(browser, dpr, path.startsWith('http') ? path : `${baseUrl}${path}`, content, ready, prepare));
      }
      for (const [p, [name]] of pages.entries()) report(`${name}, 390×844 at DPR ${dpr}`, visits[p]);
    }
  } finally {
    await browser.close();
    await floor.close();
  }
}

function report(name: string, visits: Visit[]) {
  const counted = visits.filter((v): v is Visit & { contentMs: number } => v.contentMs !== null);
  const uncounted = visits.length - counted.length;
  const rendererWait = (v: Visit) => Math.max(0, v.documentMs - v.htmlMs);
  const last = visits.at(-1)!;
  const content = counted.length
    ? `page ${figures(counted.map((v) => v.contentMs - rendererWait(v)))}, full ${figures(counted.map((v) => v.contentMs))}`
    : 'never from the server';
  console.log(
    `first visit, ${name}: content painted ${content} ` +
      `(n=${counted.length}${uncounted ? `; ${uncounted} visits not counted: content not from the server's HTML or redrawn` : ''}; goal ≤ 500 ms); ` +
      `HTML in ${figures(visits.map((v) => v.htmlMs))}, renderer ready for it after ${figures(visits.map(rendererWait))} more (browser start-up); ` +
      `largest contentful paint ${figures(visits.map((v) => v.paintedMs))}; ready (Playwright's check, after hydration) ${figures(visits.map((v) => v.readyMs))}; ` +
      `JavaScript ${(last.jsBytes / 1024).toFixed(1)} KB over the wire in ${last.jsFiles} files (${[...last.encodings].join('/')}; goal ≤ 200 KB); ${machineLoad()}`,
  );
}
