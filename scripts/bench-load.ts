/** `npm run bench:load`: autocannon against the compiled server on loopback, 50 connections × 20 s per scenario. */
import { rssMb, startBenchServer } from '../tests/bench/bench-server';
import { machineLoad, printLoad, runLoad, scenarios, signInCookie } from '../tests/bench/load-bench';

// the load generator is one address and one demo account: lift the per-minute compute limits
const server = await startBenchServer({ LIMIT_ANONYMOUS_COMPUTE_PER_MIN: '100000000', LIMIT_USER_COMPUTE_PER_MIN: '100000000', HEARTHSWAP_QUIET: '1' });
try {
  console.log(`server RSS after start: ${rssMb(server.pid).toFixed(0)} MB (goal ≤ 350 MB); ${machineLoad()}`);
  const cookie = await signInCookie(server.url);
  const seconds = Number(process.env.LOAD_SECONDS ?? 20);
  for (const scenario of scenarios(cookie)) {
    printLoad(await runLoad(server.url, server.pid, scenario, seconds));
    console.log(`  server RSS after the run: ${rssMb(server.pid).toFixed(0)} MB; ${machineLoad()}`);
  }
} finally {
  await server.stop();
}
process.exit(0);
