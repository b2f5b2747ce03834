/** `npm run bench:browser`: first-visit figures in Chromium against the compiled server. */
import { startBenchServer } from '../tests/bench/bench-server';
import { runBrowserBench } from '../tests/bench/browser-bench';

const server = await startBenchServer();
try {
  await runBrowserBench(server.url);
} finally {
  await server.stop();
}
process.exit(0);
