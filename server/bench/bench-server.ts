// What the server benchmarks share: the built server started on a database of their own, and the
// figures they print for `npm run bench` to collect.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { callsPerSecond, timingFigure, type BenchFigure } from '@yardcall/shared/bench';

export type { BenchFigure } from '@yardcall/shared/bench';

const SERVER_DIR = join(__dirname, '..');

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

// migrate.js or seed.js from the built server (both idempotent).
export function runScript(script: string, databaseUrl: string): void {
  const result = spawnSync(process.execPath, [join(SERVER_DIR, 'dist', 'database', script)], {
    cwd: SERVER_DIR,
    env: { ...process.env, DATABASE_URL: databaseUrl },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  if (result.status !== 0) throw new Error(`${script} failed with code ${result.status ?? 'null'}.`);
}

export async function startServer(databaseUrl: string): Promise<{ url: string; child: ChildProcess }> {
  const port = await freePort();
  const child = spawn(process.execPath, [join(SERVER_DIR, 'dist', 'main.js')], {
    cwd: SERVER_DIR,
    env: {
      ...process.env,
      DATABASE_URL: databaseUrl,
      PORT: String(port),
      HOST: '127.0.0.1',
      JWT_SECRET: process.env.JWT_SECRET ?? 'yardcall-bench-secret-0123456789abcdef',
      CLIENT_DIST: '/nonexistent/yardcall-client-dist',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited with code ${child.exitCode}.`);
    try {
      if ((await fetch(`${url}/api/health`)).ok) return { url, child };
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  child.kill('SIGTERM');
  throw new Error(`The server did not answer ${url}/api/health within 60 s.`);
}

const HEALTH_CALLS = 1000;

// The same machine's floor in the same run, in calls a second: how much of a figure is the route and
// how much the box.
export async function healthPerSecond(url: string): Promise<number> {
  const began = performance.now();
  for (let call = 0; call < HEALTH_CALLS; call += 1) await (await fetch(`${url}/api/health`)).arrayBuffer();
  return HEALTH_CALLS / ((performance.now() - began) / 1000);
}

// One figure from a route's timings in ms: its percentiles beside the p95 goal, and its calls a second
// as a share of the health floor.
export function routeFigure(name: string, timings: readonly number[], goal: number, floor: number): BenchFigure {
  return {
    ...timingFigure(name, timings, goal),
    ratioToHealth: Math.round((callsPerSecond(timings) / floor) * 1000) / 1000,
  };
}

// Run on its own (`tsx bench/<name>.bench.ts`): one JSON line a figure, as `npm run bench` collects them.
export function printFigures(run: () => Promise<BenchFigure[]>): void {
  run()
    .then((figures) => {
      for (const figure of figures) console.log(JSON.stringify(figure));
    })
    .catch((error: unknown) => {
      console.error(error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
