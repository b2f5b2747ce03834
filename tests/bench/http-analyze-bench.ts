/**
 * POST /api/analyze as a cook's browser meets it: one long-running server (the compiled server in its
 * own process, as `npm start` runs it) and one keep-alive connection reused for every request, the
 * way the Kitchen analyses as the cook types. Each sample is the time from writing the request to
 * the last byte of the answer, as the client receives it (compressed; decoding it is not timed).
 * Prints figures; asserts nothing.
 */
import http from 'node:http';
import { readFileSync } from 'node:fs';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { machineLoad } from './load-bench';
import { percentile, RECIPE_20 } from './server-bench';

/** What a current browser offers; the server answers brotli to it. */
const BROWSER_ENCODINGS = 'gzip, deflate, br, zstd';

export interface HttpSample {
  status: number;
  ms: number;
  wireBytes: number;
  encoding: string | undefined;
  body: Buffer;
}

export interface HttpAnalyzeFigures {
  name: string;
  samples: number[];
  /** the server process's CPU time (user + system) per recorded request, from /proc; null without a pid */
  serverCpuMs: number | null;
  wireBytes: number;
  jsonBytes: number;
  encoding: string;
}

function post(agent: http.Agent, url: URL, body: string, headers: Record<string, string>): Promise<HttpSample> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const req = http.request(
      url,
      {
        agent,
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'Content-Length': String(Buffer.byteLength(body)), 'Accept-Encoding': BROWSER_ENCODINGS, ...headers },
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => {
          const ms = performance.now() - t0;
          const raw = Buffer.concat(chunks);
          resolve({ status: res.statusCode ?? 0, ms, wireBytes: raw.length, encoding: res.headers['content-encoding'], body: raw });
        });
        res.on('error', reject);
      },
    );
    req.on('error', reject);
    req.end(body);
  });
}

/** CPU time a process has used so far, in ms (Linux /proc, clock ticks of 10 ms). */
function cpuMs(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
  // utime and stime are fields 14 and 15 of stat(5); the split above starts at field 3
  return (Number(fields[11]) + Number(fields[12])) * 10;
}

function decode(sample: HttpSample): string {
  if (sample.encoding === 'br') return brotliDecompressSync(sample.body).toString('utf8');
  if (sample.encoding === 'gzip') return gunzipSync(sample.body).toString('utf8');
  return sample.body.toString('utf8');
}

/**
 * `warmUp` unrecorded requests, then `n` recorded ones, one after another on one keep-alive
 * connection. Every answer must be a 200 naming 20 lines, or the run stops: a fast error is no figure.
 */
export async function measureAnalyze(
  baseUrl: string,
  name: string,
  { headers = {}, n = 300, warmUp = 40, pid }: { headers?: Record<string, string>; n?: number; warmUp?: number; pid?: number } = {},
): Promise<HttpAnalyzeFigures> {
  const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
  const url = new URL('/api/analyze', baseUrl);
  const body = JSON.stringify({ text: RECIPE_20, servings: 8 });
  const samples: number[] = [];
  let last: HttpSample | undefined;
  let cpuAtStart = 0;
  try {
    for (let i = 0; i < warmUp + n; i++) {
      if (i === warmUp && pid) cpuAtStart = cpuMs(pid);
      last = await post(agent, url, body, headers);
      if (last.status !== 200) throw new Error(`${name}: POST /api/analyze answered ${last.status}: ${decode(last).slice(0, 300)}`);
      if (i >= warmUp) samples.push(last.ms);
    }
  } finally {
    agent.destroy();
  }
  const json = decode(last!);
  const lines = (JSON.parse(json) as { lines: unknown[] }).lines.length;
  if (lines !== 20) throw new Error(`${name}: the answer named ${lines} lines, not 20`);
  const serverCpuMs = pid ? (cpuMs(pid) - cpuAtStart) / n : null;
  return { name, samples, serverCpuMs, wireBytes: last!.wireBytes, jsonBytes: Buffer.byteLength(json), encoding: last!.encoding ?? 'identity' };
}

export function printAnalyze(f: HttpAnalyzeFigures) {
  console.log(
    `POST /api/analyze, 20 lines, ${f.name}, long-running server, one keep-alive connection, request written → last byte read: ` +
      `p50 ${percentile(f.samples, 50).toFixed(2)} ms, p95 ${percentile(f.samples, 95).toFixed(2)} ms, p99 ${percentile(f.samples, 99).toFixed(2)} ms ` +
      `(n=${f.samples.length} after warm-up; ${(f.jsonBytes / 1024).toFixed(1)} KB of JSON sent as ${(f.wireBytes / 1024).toFixed(1)} KB ${f.encoding}; ` +
      `${f.serverCpuMs === null ? '' : `server CPU ${f.serverCpuMs.toFixed(2)} ms per request; `}target p95 ≤ 10 ms; ${machineLoad()})`,
  );
}

/**
 * A cook who stops to read the answer: `rounds` times, a pause longer than the pools' 10 s idle
 * timeout and the server's 5 s keep-alive, then one request on a new connection.
 */
export async function measureAfterPause(baseUrl: string, headers: Record<string, string>, rounds: number, pauseMs = 12_000): Promise<number[]> {
  const samples: number[] = [];
  for (let i = 0; i < rounds; i++) {
    await new Promise((resolve) => setTimeout(resolve, pauseMs));
    samples.push((await measureAnalyze(baseUrl, 'after a pause', { headers, n: 1, warmUp: 0 })).samples[0]);
  }
  return samples;
}

/** Anonymous (no cookie, as a first visit) and a signed-in cook (session cookie: the session store is read). */
export async function runHttpAnalyzeBench(baseUrl: string, signedInCookie: string, pid?: number) {
  printAnalyze(await measureAnalyze(baseUrl, 'anonymous', { pid }));
  printAnalyze(await measureAnalyze(baseUrl, 'signed-in cook', { headers: { Cookie: signedInCookie }, pid }));
  const rounds = Number(process.env.BENCH_PAUSE_ROUNDS ?? 5);
  if (rounds > 0) {
    const paused = await measureAfterPause(baseUrl, { Cookie: signedInCookie }, rounds);
    console.log(
      `  signed-in cook's first analysis after a 12 s pause, on a new connection: ${paused.map((ms) => ms.toFixed(1)).join(', ')} ms (BENCH_PAUSE_ROUNDS=${rounds}; ${machineLoad()})`,
    );
  }
}
