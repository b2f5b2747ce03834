/**
 * Load on loopback with autocannon, bounded in time: 50 connections for 20 s per scenario against
 * the compiled server in its own process. Prints req/s, latency p50/p95/p99, errors and the server's
 * resident memory (after start, peak during the run). Asserts nothing.
 */
import autocannon from 'autocannon';
import { loadavg } from 'node:os';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';
import { percentile, RECIPE_20 } from './server-bench';
import { rssMb } from './bench-server';

const REWRITE_TEXT = `12 oz elbow macaroni
2 cups shredded sharp cheddar
2 1/2 cups whole milk
3 tbsp butter
3 tbsp all-purpose flour
1 lb ground beef
1/2 cup grated parmesan
1 cup sour cream`;

/** A signed-in demo cook's session cookie. */
export async function signInCookie(baseUrl: string): Promise<string> {
  const cook = DEMO_ACCOUNTS.find((a) => a.role === 'cook')!;
  const first = await fetch(`${baseUrl}/api/auth/csrf`);
  const anonymous = first.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { token } = (await first.json()) as { token: string };
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token, Cookie: anonymous },
    body: JSON.stringify({ email: cook.email, password: cook.password }),
  });
  if (res.status !== 200) throw new Error(`demo sign-in failed: ${res.status}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

type Request = { method: 'GET' | 'POST'; path: string; body?: string; headers?: Record<string, string> };

export interface LoadScenario {
  name: string;
  requests: Request[];
}

export function scenarios(cookie: string): LoadScenario[] {
  const json = { 'content-type': 'application/json' };
  const analyze: Request = { method: 'POST', path: '/api/analyze', headers: json, body: JSON.stringify({ text: RECIPE_20, servings: 8 }) };
  const list: Request = { method: 'GET', path: '/api/recipes', headers: { cookie } };
  const signedInAnalyze: Request = { ...analyze, headers: { ...json, cookie } };
  const rewrite: Request = {
    method: 'POST',
    path: '/api/rewrite',
    headers: { ...json, cookie },
    body: JSON.stringify({ text: REWRITE_TEXT, servings: 6, targets: { proteinMinG: 40, kcalMax: 600 } }),
  };
  return [
    { name: 'analyze (anonymous, 20 lines)', requests: [analyze] },
    { name: 'signed-in recipe list', requests: [list] },
    // each connection walks this list in turn: 1 rewrite, 3 analyses and 6 list reads in 10 requests
    {
      name: 'mix: list 60%, analyze 30%, rewrite 10%',
      requests: [list, signedInAnalyze, list, rewrite, list, signedInAnalyze, list, list, signedInAnalyze, list],
    },
  ];
}

export interface LoadFigures {
  name: string;
  requestsPerSec: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  non2xx: number;
  total: number;
  peakRssMb: number;
}

export async function runLoad(baseUrl: string, pid: number, scenario: LoadScenario, seconds = 20, connections = 50): Promise<LoadFigures> {
  const latencies: number[] = [];
  let peak = rssMb(pid);
  const sampler = setInterval(() => {
    peak = Math.max(peak, rssMb(pid));
  }, 200);
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon({ url: baseUrl, connections, duration: seconds, requests: scenario.requests, timeout: 10 }, (error, r) =>
      error ? reject(error) : resolve(r),
    );
    instance.on('response', (_client, _status, _bytes, responseTime) => latencies.push(responseTime));
  });
  clearInterval(sampler);
  peak = Math.max(peak, rssMb(pid));
  return {
    name: scenario.name,
    requestsPerSec: result.requests.average,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
    total: latencies.length,
    peakRssMb: peak,
  };
}

export function printLoad(f: LoadFigures) {
  console.log(
    `${f.name}: ${f.requestsPerSec.toFixed(0)} req/s; latency p50 ${f.p50.toFixed(0)} ms, p95 ${f.p95.toFixed(0)} ms, p99 ${f.p99.toFixed(0)} ms; ` +
      `${f.total} answers, ${f.non2xx} not 2xx, ${f.errors} errors/timeouts; server RSS peak ${f.peakRssMb.toFixed(0)} MB (goal ≤ 600 MB)`,
  );
}

export function machineLoad() {
  return `load average ${loadavg()
    .map((l) => l.toFixed(1))
    .join(' ')} on this machine`;
}
