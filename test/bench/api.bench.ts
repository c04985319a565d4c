/**
 * POST /api/sizing over loopback, signed in as the demo rider, against the bare JSON route of the
 * same server process (`api-server.ts`), at 10 and at 100 connections, `BENCH_SECONDS` (10) each.
 * autocannon runs in this process and the server in its own, so on two cores each has one.
 */
import autocannon from 'autocannon';
import { DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import body from '../server/fixtures/sizing-two-ends.json';
import { startChildServer } from '../support/child-server';
import { BenchRow, formatLatency, Latency, summariseLatencies } from './measure';

const RIDER_EMAIL = 'rider@demo.test';
const WARM_UP_SECONDS = 2;

interface BenchServer {
  url: string;
  stop: () => Promise<void>;
}

async function startBenchServer(): Promise<BenchServer> {
  const server = await startChildServer({ script: 'test/bench/api-server.ts', portLine: /\{"port":(\d+)\}/ });
  return { url: `http://127.0.0.1:${server.port}`, stop: server.stop };
}

async function signIn(url: string): Promise<string> {
  const response = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: RIDER_EMAIL, password: DEMO_PASSWORD }),
  });
  if (response.status !== 200) throw new Error(`sign-in answered ${response.status}: ${await response.text()}`);
  return ((await response.json()) as { token: string }).token;
}

interface Target {
  name: string;
  url: string;
  headers: Record<string, string>;
}

interface Load {
  requestsPerSecond: number;
  latency: Latency;
}

/**
 * Every response's time as autocannon measured it (its own histogram keeps whole milliseconds);
 * any error, timeout or answer other than 2xx makes the run worthless, so it throws.
 */
function runLoad(target: Target, connections: number, seconds: number): Promise<Load> {
  const samplesMs: number[] = [];
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url: target.url,
        method: 'POST',
        headers: { 'content-type': 'application/json', ...target.headers },
        body: JSON.stringify(body),
        connections,
        duration: seconds,
      },
      (error, result) => {
        if (error) return reject(error);
        if (result.errors || result.timeouts || result.non2xx) {
          return reject(
            new Error(`${target.name} at ${connections} connections: ${result.non2xx} answers other than 2xx, ${result.errors} errors, ${result.timeouts} timeouts`),
          );
        }
        resolve({ requestsPerSecond: samplesMs.length / result.duration, latency: summariseLatencies(samplesMs) });
      },
    );
    instance.on('response', (_client, _status, _bytes, responseTimeMs) => samplesMs.push(responseTimeMs));
  });
}

function benchSeconds(): number {
  const raw = process.env.BENCH_SECONDS;
  const seconds = raw === undefined ? 10 : Number(raw);
  if (!(seconds >= 1)) throw new Error(`BENCH_SECONDS must be a number of seconds, at least 1, not "${raw}"`);
  return seconds;
}

const perSecond = (load: Load) => `${Math.round(load.requestsPerSecond).toLocaleString('en')} req/s`;

/** At 10 connections p99 has an absolute target; at 100, where requests queue, one relative to the bare route's. */
function rowsAt(connections: number, sizing: Load, bare: Load): BenchRow[] {
  const throughput = sizing.requestsPerSecond / bare.requestsPerSecond;
  const p99Ratio = sizing.latency.p99Ms / bare.latency.p99Ms;
  const absolute = connections <= 10;
  return [
    {
      name: `API ${connections} conn: sizing throughput`,
      figure: perSecond(sizing),
      baseline: `bare ${perSecond(bare)}`,
      ratio: throughput,
      target: '>= 0.60 of bare',
      met: throughput >= 0.6,
      shortfall: 'a sizing validates some fifty numbers through the shared Yup schema, runs the engine and sends a 20 KB answer; the bare route only echoes the body.',
    },
    {
      name: `API ${connections} conn: sizing latency`,
      figure: formatLatency(sizing.latency),
      baseline: `bare ${formatLatency(bare.latency)}`,
      ratio: p99Ratio,
      target: absolute ? 'p99 < 10 ms' : 'p99 <= 1.5 x bare p99',
      met: absolute ? sizing.latency.p99Ms < 10 : p99Ratio <= 1.5,
      shortfall: 'requests queue behind each sizing\'s CPU time (validation, engine, serialising) on the one event loop; see the throughput row.',
    },
  ];
}

export async function benchApi(): Promise<BenchRow[]> {
  const seconds = benchSeconds();
  const server = await startBenchServer();
  try {
    const token = await signIn(server.url);
    const bare: Target = { name: 'bare route', url: `${server.url}/bench/bare`, headers: {} };
    const sizing: Target = { name: 'sizing', url: `${server.url}/api/sizing`, headers: { authorization: `Bearer ${token}` } };
    // The server's JIT and the sizing cache warm up before anything is timed.
    await runLoad(bare, 10, WARM_UP_SECONDS);
    await runLoad(sizing, 10, WARM_UP_SECONDS);
    const rows: BenchRow[] = [];
    for (const connections of [10, 100]) {
      const bareLoad = await runLoad(bare, connections, seconds);
      const sizingLoad = await runLoad(sizing, connections, seconds);
      rows.push(...rowsAt(connections, sizingLoad, bareLoad));
    }
    return rows;
  } finally {
    await server.stop();
  }
}
