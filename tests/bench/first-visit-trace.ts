/**
 * One fresh visit recorded as a Chromium performance trace, broken into where its time went.
 * Usage: npx tsx tests/bench/first-visit-trace.ts http://127.0.0.1:3105/ [--sign-in] [--dpr=3] [--save=file.json]
 */
import { writeFileSync } from 'node:fs';
import { launchBrowser } from '../helpers/browser';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';
import { WINDOW_UI_FEATURES } from './browser-bench';

interface TraceEvent {
  name: string;
  cat: string;
  ph: string;
  ts: number;
  dur?: number;
  /** thread (CPU) time of the slice: on a loaded machine much less than dur, which counts waiting for a core */
  tdur?: number;
  pid: number;
  tid: number;
  args?: Record<string, unknown> & { data?: Record<string, unknown> };
}

const url = process.argv[2] ?? 'http://127.0.0.1:3105/';
const signIn = process.argv.includes('--sign-in');
const dpr = Number(process.argv.find((a) => a.startsWith('--dpr='))?.slice(6) ?? 3);
const save = process.argv.find((a) => a.startsWith('--save='))?.slice(7);

const browser = await launchBrowser({ disableFeatures: process.env.BROWSER_UI ? [] : WINDOW_UI_FEATURES });
const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, deviceScaleFactor: dpr });
if (signIn) {
  const cook = DEMO_ACCOUNTS.find((a) => a.role === 'cook')!;
  const base = new URL(url).origin;
  const csrf = (await (await context.request.get(`${base}/api/auth/csrf`)).json()) as { token: string };
  await context.request.post(`${base}/api/auth/login`, { headers: { 'X-CSRF-Token': csrf.token }, data: { email: cook.email, password: cook.password } });
}
const page = await context.newPage();
const categories = [
  'devtools.timeline',
  'disabled-by-default-devtools.timeline',
  'disabled-by-default-devtools.timeline.frame',
  'blink.user_timing',
  'loading',
  'navigation',
  'toplevel',
  'v8.execute',
  'blink',
  'cc',
  'benchmark',
  'rail',
  'fonts',
  ...(process.env.TRACE_MORE ?? '').split(',').filter(Boolean),
];
await browser.startTracing(page, { categories });
await page.goto(url, { waitUntil: 'networkidle' });
await page.waitForTimeout(300);
const nav = await page.evaluate(() => {
  const n = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming;
  const paints = Object.fromEntries(performance.getEntriesByType('paint').map((p) => [p.name, p.startTime]));
  const resources = (performance.getEntriesByType('resource') as PerformanceResourceTiming[]).map((r) => ({
    name: r.name.replace(location.origin, ''),
    start: r.startTime,
    responseStart: r.responseStart,
    end: r.responseEnd,
    bytes: r.transferSize,
  }));
  return {
    responseStart: n.responseStart,
    responseEnd: n.responseEnd,
    domInteractive: n.domInteractive,
    domContentLoaded: n.domContentLoadedEventEnd,
    load: n.loadEventEnd,
    bytes: n.transferSize,
    decoded: n.decodedBodySize,
    paints,
    resources,
  };
});
const buffer = await browser.stopTracing();
await context.close();
await browser.close();
if (save) writeFileSync(save, buffer);

const events = (JSON.parse(buffer.toString()) as { traceEvents: TraceEvent[] }).traceEvents;
// the renderer that drew the page: the one with the navigation's first paint
const fcp = events.find((e) => e.name === 'firstContentfulPaint');
const navStart = events.find((e) => e.name === 'navigationStart' && e.pid === fcp?.pid && (e.args?.data?.documentLoaderURL as string)?.startsWith('http'));
if (!fcp || !navStart) throw new Error('no first contentful paint or navigation start in the trace');
const t0 = navStart.ts;
const ms = (ts: number) => ((ts - t0) / 1000).toFixed(1).padStart(7);
const main = events.filter((e) => e.pid === fcp.pid && e.tid === navStart.tid);

console.log(
  `${url} at DPR ${dpr}: HTML ${nav.bytes} B on the wire (${nav.decoded} B), responseStart ${nav.responseStart.toFixed(1)}, responseEnd ${nav.responseEnd.toFixed(1)}`,
);
console.log(`domInteractive ${nav.domInteractive.toFixed(1)}, DOMContentLoaded ${nav.domContentLoaded.toFixed(1)}, load ${nav.load.toFixed(1)}`);
console.log(`paint entries: ${JSON.stringify(nav.paints)}`);
console.log('resources (start / responseStart / end, ms from navigation start):');
for (const r of nav.resources)
  console.log(`  ${r.start.toFixed(1).padStart(7)} ${r.responseStart.toFixed(1).padStart(7)} ${r.end.toFixed(1).padStart(7)}  ${r.bytes}B ${r.name}`);

// the renderer main thread's own work, by kind, from the navigation's start until the first contentful paint
const kinds: Record<string, number> = {};
const kindsCpu: Record<string, number> = {};
const wanted = new Set([
  'ParseHTML',
  'EvaluateScript',
  'v8.compile',
  'v8.compileModule',
  'v8.evaluateModule',
  'FunctionCall',
  'UpdateLayoutTree',
  'Layout',
  'PrePaint',
  'Paint',
  'Layerize',
  'UpdateLayer',
  'CompositeLayers',
  'Commit',
  'ParseAuthorStyleSheet',
  'RunMicrotasks',
  'TimerFire',
  'FireAnimationFrame',
  'v8.run',
  'ScheduleStyleRecalculation',
  'HitTest',
]);
console.log('\nrenderer main thread until first contentful paint (start, duration ms):');
for (const e of main) {
  if (e.ph !== 'X' || e.ts > fcp.ts + 5_000 || e.ts < t0) continue;
  if (!wanted.has(e.name)) continue;
  const dur = (e.dur ?? 0) / 1000;
  if (e.ts <= fcp.ts) {
    kinds[e.name] = (kinds[e.name] ?? 0) + dur;
    kindsCpu[e.name] = (kindsCpu[e.name] ?? 0) + (e.tdur ?? 0) / 1000;
  }
  if (dur >= 2 && e.ts <= fcp.ts + 200_000) {
    const detail = (e.args?.data?.url as string | undefined)?.replace(/^https?:\/\/[^/]+/, '') ?? (e.args?.beginData as { url?: string })?.url ?? '';
    console.log(`  ${ms(e.ts)} ${dur.toFixed(1).padStart(6)}  ${e.name} ${detail}`);
  }
}
const marks = [
  'navigationStart',
  'fetchStart',
  'responseEnd',
  'domLoading',
  'domInteractive',
  'domContentLoadedEventEnd',
  'firstPaint',
  'firstContentfulPaint',
  'firstMeaningfulPaint',
  'largestContentfulPaint::Candidate',
  'MarkFirstPaint',
];
console.log('\nmarks:');
for (const e of events.filter((e) => e.pid === fcp.pid && marks.includes(e.name) && e.ts >= t0).slice(0, 30)) console.log(`  ${ms(e.ts)} ${e.name}`);
console.log('\ntotals before first contentful paint (wall):', Object.fromEntries(Object.entries(kinds).map(([k, v]) => [k, Number(v.toFixed(1))])));
console.log('the same in CPU (thread) time:', Object.fromEntries(Object.entries(kindsCpu).map(([k, v]) => [k, Number(v.toFixed(1))])));
// browser-side: when the renderer process for the page started
for (const e of events
  .filter(
    (e) => /RenderProcessHost|ProcessLaunch|ChildProcessLauncher|RendererMain|NavigationRequest|CommitNavigation|DidCommit/.test(e.name) && e.ts >= t0 - 50_000,
  )
  .slice(0, 40))
  console.log(`  ${ms(e.ts)} ${((e.dur ?? 0) / 1000).toFixed(1).padStart(6)} ${e.ph} ${e.name} pid ${e.pid}`);
