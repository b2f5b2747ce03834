/**
 * `npm run bench:browser`: first-visit figures in Chromium against the compiled server.
 * BENCH_URL=http://127.0.0.1:3000 measures a server already running (`npm start`) instead.
 */
import { startBenchServer } from '../tests/bench/bench-server';
import { runBrowserBench } from '../tests/bench/browser-bench';

const server = process.env.BENCH_URL ? { url: process.env.BENCH_URL.replace(/\/$/, ''), stop: async () => {} } : await startBenchServer();
try {
  await runBrowserBench(server.url);
} finally {
  await server.stop();
}
process.exit(0);
