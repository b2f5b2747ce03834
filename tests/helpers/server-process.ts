import { spawn, type ChildProcess } from 'node:child_process';
import { once } from 'node:events';

export interface ServerProcess {
  url: string;
  pid: number;
  /** the process's output so far, for a failure message */
  output: () => string;
  stop: () => Promise<void>;
}

/**
 * Runs the compiled server (`node <entry>`, see scripts/build-server.ts) as its own process on a free
 * loopback port and waits until it says where it listens.
 */
export async function startServerProcess(entry: string, env: NodeJS.ProcessEnv, timeoutMs = 90_000): Promise<ServerProcess> {
  const child: ChildProcess = spawn(process.execPath, [entry], {
    env: { ...process.env, HOST: '127.0.0.1', PORT: '0', HEARTHSWAP_QUIET: '1', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout!.on('data', (chunk: Buffer) => (log += chunk.toString()));
  child.stderr!.on('data', (chunk: Buffer) => (log += chunk.toString()));
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start in ${timeoutMs} ms:\n${log}`)), timeoutMs);
    const check = () => {
      const m = /serving on (http:\/\/127\.0\.0\.1:\d+)/.exec(log);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]);
      }
    };
    child.stdout!.on('data', check);
    child.on('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with code ${code}:\n${log}`));
    });
  });
  return {
    url,
    pid: child.pid!,
    output: () => log,
    stop: async () => {
      if (child.exitCode !== null || child.signalCode !== null) return;
      child.kill('SIGTERM');
      await once(child, 'exit');
    },
  };
}

/** fetch with a cookie jar that can be carried from one server to another, as a load balancer would. */
export class CookieJar {
  private cookies = new Map<string, string>();

  header() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  async fetch(url: string, init: RequestInit = {}) {
    const headers = new Headers(init.headers);
    if (this.cookies.size) headers.set('Cookie', this.header());
    const res = await fetch(url, { ...init, headers, redirect: 'manual' });
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const eq = pair.indexOf('=');
      this.cookies.set(pair.slice(0, eq).trim(), pair.slice(eq + 1).trim());
    }
    return res;
  }

  async json(url: string, method = 'GET', body?: unknown, csrf?: string) {
    const headers: Record<string, string> = {};
    if (body !== undefined) headers['Content-Type'] = 'application/json';
    if (csrf) headers['X-CSRF-Token'] = csrf;
    const res = await this.fetch(url, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
    const text = await res.text();
    return { status: res.status, body: text ? (JSON.parse(text) as Record<string, unknown>) : {} };
  }
}
