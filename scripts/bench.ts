// `npm run bench`: the benchmarks, each against its goal; figures go into docs/benchmarks.md.
import { mkdirSync, writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { join } from 'node:path';
import { projectRoot } from './lib/run.js';
import { say } from './lib/log.js';

export interface BenchFigure {
  name: string;
  unit: string;
  p50: number;
  p95: number;
  p99: number;
  goal: number;
}

type BenchModule = Record<string, () => BenchFigure[] | Promise<BenchFigure[]>>;

const BENCHES: { file: string; run: string }[] = [
  { file: 'shared/src/checklist/checklist.bench.ts', run: 'runChecklistBench' },
  { file: 'shared/src/interpreter/interpreter.bench.ts', run: 'runInterpreterBench' },
  { file: 'shared/src/narration/narration.bench.ts', run: 'runNarrationBench' },
];

const figures: BenchFigure[] = [];
for (const bench of BENCHES) {
  say(`bench: ${bench.file}`);
  const module = (await import(join(projectRoot, bench.file))) as BenchModule;
  const runBench = module[bench.run];
  if (!runBench) throw new Error(`${bench.file} does not export ${bench.run}.`);
  figures.push(...(await runBench()));
}

const format = (n: number) => (n < 10 ? n.toFixed(3) : n.toFixed(1));
console.log(`\n| benchmark | p50 | p95 | p99 | goal | within goal |\n|---|---|---|---|---|---|`);
for (const f of figures) {
  console.log(
    `| ${f.name} | ${format(f.p50)} ${f.unit} | ${format(f.p95)} ${f.unit} | ${format(f.p99)} ${f.unit} | ${f.goal} ${f.unit} | ${f.p99 <= f.goal ? 'yes' : 'NO'} |`,
  );
}
const machine = `${cpus().length} × ${cpus()[0]?.model ?? 'unknown CPU'}, Node ${process.versions.node}`;
console.log(`\nMachine: ${machine}`);
mkdirSync(join(projectRoot, '.test-output'), { recursive: true });
writeFileSync(
  join(projectRoot, '.test-output', 'benchmarks.json'),
  JSON.stringify({ machine, at: new Date().toISOString(), figures }, null, 2),
);
