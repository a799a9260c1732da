// `npm run bench`: every benchmark against its goal; the figures go into docs/benchmarks.md.
import { mkdirSync, writeFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { buildIfChanged } from './lib/build.js';
import { say } from './lib/log.js';
import { startCluster } from './lib/postgres.js';
import { projectRoot, run } from './lib/run.js';
import { freshDatabase, startSeededServer } from './lib/stack.js';
import { measureFirstLoadJs } from './lib/first-load.js';
import { measureVoiceLoop } from './lib/voice-loop-latency.js';
import { measureTalkTime } from './lib/talk-time.js';
import { measureLighthouse } from './lib/lighthouse.js';
import { singleFigure, type BenchFigure } from '../shared/src/bench/index.js';

type BenchModule = Record<string, () => BenchFigure[] | Promise<BenchFigure[]>>;

const SHARED_BENCHES: { file: string; run: string }[] = [
  { file: 'shared/src/checklist/checklist.bench.ts', run: 'runChecklistBench' },
  { file: 'shared/src/interpreter/interpreter.bench.ts', run: 'runInterpreterBench' },
  { file: 'shared/src/narration/narration.bench.ts', run: 'runNarrationBench' },
];

const SERVER_BENCHES: { file: string; what: string; database: string }[] = [
  { file: 'server/bench/results-upsert.bench.ts', what: 'PUT /api/inspections/:id/results', database: 'results' },
  {
    file: 'server/bench/inspections-list.bench.ts',
    what: 'GET /api/inspections over 100 000 inspections',
    database: 'list',
  },
];

const figures: BenchFigure[] = [];
const loadBefore = loadavg()[0] ?? 0;

for (const bench of SHARED_BENCHES) {
  say(`bench: ${bench.file}`);
  const module = (await import(join(projectRoot, bench.file))) as BenchModule;
  const runBench = module[bench.run];
  if (!runBench) throw new Error(`${bench.file} does not export ${bench.run}.`);
  figures.push(...(await runBench()));
}

await buildIfChanged('shared');
await Promise.all([buildIfChanged('server'), buildIfChanged('client')]);
const cluster = startCluster({
  name: 'postgres-test',
  port: Number(process.env.YARDCALL_TEST_PG_PORT ?? 54339),
  durable: false,
});
try {
  const runId = `${Date.now().toString(36)}_${process.pid}`;
  // Each against the built server on a database of its own; each prints one JSON figure a line.
  for (const bench of SERVER_BENCHES) {
    say(`bench: ${bench.what} (${bench.file})`);
    const database = await freshDatabase(cluster.adminUrl(), `yardcall_bench_${bench.database}_${runId}`);
    const result = await run('npx', ['tsx', bench.file], {
      capture: true,
      env: { ...process.env, DATABASE_URL: database, NODE_ENV: 'test' },
    });
    if (result.code !== 0) throw new Error(`${bench.file} failed (see above).`);
    for (const line of result.output.split('\n')) {
      if (line.startsWith('{')) figures.push(JSON.parse(line) as BenchFigure);
    }
  }

  say('bench: first-load JavaScript of the driver routes in Chromium');
  const server = await startSeededServer(cluster.adminUrl(), `yardcall_bench_web_${runId}`);
  try {
    figures.push(...(await measureFirstLoadJs(server.url)));
    say('bench: Lighthouse mobile profile (sign-in LCP cold, /driver/start TBT signed in)');
    figures.push(...(await measureLighthouse(server.url)));
    say('bench: a walk-around by voice in Chromium (answer-to-prompt latency, voice-note size)');
    figures.push(...(await measureVoiceLoop(server.url)));
    say('bench: the modelled talk time of a tractor + trailer pre-trip by voice in Chromium');
    const talk = await measureTalkTime(server.url);
    figures.push(
      singleFigure(
        `modelled talk time, demo tractor + 2-axle trailer pre-trip by voice: ${talk.prompts} prompts, ${talk.words} words at 2.8 a second, ${talk.answers} answers at 2.0 s; ${talk.itemsOnServer} of ${talk.items} items on the server`,
        'min',
        talk.minutes,
        8,
      ),
    );
  } finally {
    await server.stop();
  }
} finally {
  cluster.stop();
}

const format = (n: number) => (n < 10 ? n.toFixed(3) : n.toFixed(1));
const lines = [
  '| benchmark | p50 | p95 | p99 | goal | within goal |',
  '|---|---|---|---|---|---|',
  ...figures.map((f) => {
    const at = f.judgedAt ?? 'p95';
    const within = f[at] <= f.goal ? 'yes' : 'NO';
    const ratio = f.ratioToHealth !== undefined ? ` (throughput ${f.ratioToHealth} × /api/health)` : '';
    return `| ${f.name}${ratio} | ${format(f.p50)} ${f.unit} | ${format(f.p95)} ${f.unit} | ${format(f.p99)} ${f.unit} | ${at} ≤ ${f.goal} ${f.unit} | ${within} |`;
  }),
];
const machine = `${cpus().length} × ${cpus()[0]?.model ?? 'unknown CPU'}, Node ${process.versions.node}, load average ${loadBefore.toFixed(1)} at start`;
console.log(`\n${lines.join('\n')}\n\nMachine: ${machine}`);
mkdirSync(join(projectRoot, '.test-output'), { recursive: true });
writeFileSync(
  join(projectRoot, '.test-output', 'benchmarks.json'),
  JSON.stringify({ machine, at: new Date().toISOString(), figures }, null, 2),
);
writeFileSync(join(projectRoot, '.test-output', 'benchmarks.md'), `${lines.join('\n')}\n\nMachine: ${machine}\n`);
