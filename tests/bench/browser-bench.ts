/**
 * First visit of the Kitchen and the recipe book on a phone profile in Chromium, with an empty cache:
 * time from navigation to content on screen, and the JavaScript it downloaded (bytes on the wire,
 * compressed). Prints figures; asserts nothing. Goals (issue 13/14): ≤ 500 ms on loopback, ≤ 200 KB.
 *
 * "Content" is when Playwright finds the page's content visible; its checks run on the page's main
 * thread, so they wait while the app's code hydrates. "Painted" is the browser's own largest
 * contentful paint of the same visit: when the content was on screen.
 */
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser } from '../helpers/browser';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';
import { percentile } from './server-bench';
import { machineLoad } from './load-bench';

const PHONE = {
  viewport: { width: 390, height: 844 },
  deviceScaleFactor: 3,
  isMobile: true,
  hasTouch: true,
  userAgent: 'Mozilla/5.0 (Linux; Android 14; Pixel 8) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/120.0 Mobile Safari/537.36',
};

interface Visit {
  ms: number;
  /** largest contentful paint, from the navigation's start */
  paintedMs: number;
  jsBytes: number;
  jsFiles: number;
  encodings: Set<string>;
}

async function firstVisit(
  browser: Browser,
  url: string,
  ready: (page: Page) => Promise<void>,
  prepare?: (context: BrowserContext) => Promise<void>,
): Promise<Visit> {
  const context = await browser.newContext(PHONE);
  try {
    if (prepare) await prepare(context);
    const page = await context.newPage();
    const scripts: Promise<{ bytes: number; encoding: string }>[] = [];
    page.on('requestfinished', (request) => {
      if (request.resourceType() !== 'script') return;
      scripts.push(
        Promise.all([request.sizes(), request.response()]).then(([sizes, response]) => ({
          bytes: sizes.responseBodySize,
          encoding: response?.headers()['content-encoding'] ?? 'identity',
        })),
      );
    });
    const t0 = performance.now();
    await page.goto(url, { waitUntil: 'commit' });
    await ready(page);
    const ms = performance.now() - t0;
    await page.waitForLoadState('networkidle');
    const paintedMs = await page.evaluate(
      () =>
        new Promise<number>((resolve) => {
          new PerformanceObserver((list) => resolve(list.getEntries().at(-1)!.startTime)).observe({ type: 'largest-contentful-paint', buffered: true });
        }),
    );
    const done = await Promise.all(scripts);
    return { ms, paintedMs, jsBytes: done.reduce((s, d) => s + d.bytes, 0), jsFiles: done.length, encodings: new Set(done.map((d) => d.encoding)) };
  } finally {
    await context.close();
  }
}

export async function runBrowserBench(baseUrl: string, rounds = 7) {
  const browser = await launchBrowser();
  const cook = DEMO_ACCOUNTS.find((a) => a.role === 'cook')!;
  const signIn = async (context: BrowserContext) => {
    const csrf = (await (await context.request.get(`${baseUrl}/api/auth/csrf`)).json()) as { token: string };
    const res = await context.request.post(`${baseUrl}/api/auth/login`, {
      headers: { 'X-CSRF-Token': csrf.token },
      data: { email: cook.email, password: cook.password },
    });
    if (!res.ok()) throw new Error(`demo sign-in failed: ${res.status()}`);
  };
  const pages: [string, string, (page: Page) => Promise<void>, ((c: BrowserContext) => Promise<void>)?][] = [
    ['Kitchen (signed out)', '/', (page) => page.getByRole('heading', { name: 'Kitchen', level: 1 }).waitFor()],
    ['Recipe book (demo cook)', '/recipes', (page) => page.getByText('Weeknight baked ziti').filter({ visible: true }).first().waitFor(), signIn],
  ];
  try {
    await firstVisit(browser, `${baseUrl}/`, pages[0][2]); // warm the server, not the browser
    for (const [name, path, ready, prepare] of pages) {
      const visits: Visit[] = [];
      for (let i = 0; i < rounds; i++) visits.push(await firstVisit(browser, `${baseUrl}${path}`, ready, prepare));
      const ms = visits.map((v) => v.ms);
      const painted = visits.map((v) => v.paintedMs);
      const last = visits.at(-1)!;
      console.log(
        `first visit, phone profile, ${name}: content after p50 ${percentile(ms, 50).toFixed(0)} ms, worst ${Math.max(...ms).toFixed(0)} ms (n=${rounds}, goal ≤ 500 ms); ` +
          `painted (largest contentful paint) p50 ${percentile(painted, 50).toFixed(0)} ms, worst ${Math.max(...painted).toFixed(0)} ms; ` +
          `JavaScript ${(last.jsBytes / 1024).toFixed(1)} KB over the wire in ${last.jsFiles} files (${[...last.encodings].join('/')}; goal ≤ 200 KB); ${machineLoad()}`,
      );
    }
  } finally {
    await browser.close();
  }
}
