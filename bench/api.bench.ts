/**
 * Load on the API: `npx tsx bench/api.bench.ts`. Brings up its own private
 * MariaDB (bringUpDatabase('bench')), starts the server in this process, and
 * drives it with autocannon on loopback from a child process (so the load
 * generator does not share the server's event loop): GET /api/v1/health and
 * POST /api/v1/calculate in the same run, one after the other.
 * Goals (issue 4): calculate holds ≥ 70 % of health's requests/s, and the
 * server's memory stays flat across repeated calculate runs.
 */
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { startServer } from '../server/main';
import { bringUpDatabase } from '../scripts/bring-up';

const DURATION_SECONDS = 8;
const WARMUP_SECONDS = 2;
const CONNECTIONS = 20;
const THROUGHPUT_GOAL = 0.7;
/** Heap growth between the first and the last calculate run beyond this counts as not flat. */
const FLAT_HEAP_GROWTH_BYTES = 20 * 1024 * 1024;
const CALCULATE_BODY = JSON.stringify({ spec: { kind: 'microstrip', w: '0.3 mm', h: '0.17 mm', t: '1 oz', er: 4.2, tanDelta: 0.02, frequency: '1 GHz', length: '100 mm' } });

interface Load {
  requestsPerSecond: number;
  p99Ms: number;
  non2xx: number;
}

async function load(url: string, seconds: number, post?: string): Promise<Load> {
  const args = ['node_modules/autocannon/autocannon.js', '--json', '-c', String(CONNECTIONS), '-d', String(seconds)];
  if (post) args.push('-m', 'POST', '-H', 'content-type=application/json', '-b', post);
  const { stdout } = await promisify(execFile)('node', [...args, url], { maxBuffer: 16 * 1024 * 1024 });
  const result = JSON.parse(stdout);
  return { requestsPerSecond: result.requests.average, p99Ms: result.latency.p99, non2xx: result.non2xx + result.errors };
}

// Collect garbage before each memory reading, so the readings show what is retained, not what awaits collection.
setFlagsFromString('--expose-gc');
const collectGarbage = runInNewContext('gc') as () => void;
function retainedMemory(): NodeJS.MemoryUsage {
  collectGarbage();
  return process.memoryUsage();
}

const megabytes = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;

const stack = await bringUpDatabase('bench', () => {});
const server = await startServer({ ...stack.env, LOG_LEVEL: 'silent' });
try {
  const health = `${server.url}/api/v1/health`;
  const calculate = `${server.url}/api/v1/calculate`;
  await load(health, WARMUP_SECONDS);
  await load(calculate, WARMUP_SECONDS, CALCULATE_BODY);
  const before = retainedMemory();

  const healthLoad = await load(health, DURATION_SECONDS);
  const calculateLoad = await load(calculate, DURATION_SECONDS, CALCULATE_BODY);
  const afterFirst = retainedMemory();
  const calculateAgain = await load(calculate, DURATION_SECONDS, CALCULATE_BODY);
  const after = retainedMemory();

  const ratio = calculateLoad.requestsPerSecond / healthLoad.requestsPerSecond;
  const heapGrowth = after.heapUsed - afterFirst.heapUsed;
  console.table([
    { name: 'GET /api/v1/health', 'req/s': Math.round(healthLoad.requestsPerSecond), 'p99 ms': healthLoad.p99Ms, 'non-2xx': healthLoad.non2xx },
    { name: 'POST /api/v1/calculate', 'req/s': Math.round(calculateLoad.requestsPerSecond), 'p99 ms': calculateLoad.p99Ms, 'non-2xx': calculateLoad.non2xx },
    { name: 'POST /api/v1/calculate (again)', 'req/s': Math.round(calculateAgain.requestsPerSecond), 'p99 ms': calculateAgain.p99Ms, 'non-2xx': calculateAgain.non2xx },
  ]);
  console.table([
    { name: 'calculate / health throughput', value: `${(ratio * 100).toFixed(0)} %`, goal: `≥ ${THROUGHPUT_GOAL * 100} %`, result: ratio >= THROUGHPUT_GOAL ? 'PASS' : 'MISS' },
    {
      name: 'server memory (heap / rss)',
      value: `${megabytes(before.heapUsed)} / ${megabytes(before.rss)} → ${megabytes(after.heapUsed)} / ${megabytes(after.rss)}`,
      goal: `retained heap growth over the last run < ${megabytes(FLAT_HEAP_GROWTH_BYTES)}`,
      result: heapGrowth < FLAT_HEAP_GROWTH_BYTES ? 'PASS' : 'MISS',
    },
  ]);
} finally {
  await server.close();
  await stack.stop();
}
