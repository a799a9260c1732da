// `npm test`: the same set-up as `npm start`, a fresh database per run, then every suite.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { buildIfChanged } from './lib/build.js';
import { say } from './lib/log.js';
import { dropDatabase, startCluster, type PostgresCluster } from './lib/postgres.js';
import { aptInstall, projectRoot, run } from './lib/run.js';
import { freshDatabase, startSeededServer, type SeededServer } from './lib/stack.js';

interface SuiteResult {
  name: string;
  passed: number;
  failed: number;
  skipped: number;
  seconds: number;
  note?: string;
}

const outputDir = join(projectRoot, '.test-output');
const results: SuiteResult[] = [];
const startedAt = Date.now();
let cluster: PostgresCluster | undefined;
let server: SeededServer | undefined;

function readJson(path: string): unknown {
  return existsSync(path) ? JSON.parse(readFileSync(path, 'utf8')) : undefined;
}

// Vitest and Jest both write Jest's JSON result format.
function countJestLike(path: string): Pick<SuiteResult, 'passed' | 'failed' | 'skipped'> | undefined {
  const report = readJson(path) as
    | {
        numPassedTests: number;
        numFailedTests: number;
        numPendingTests: number;
        numTodoTests?: number;
        numRuntimeErrorTestSuites?: number;
      }
    | undefined;
  if (!report) return undefined;
  return {
    passed: report.numPassedTests,
    failed: report.numFailedTests + (report.numRuntimeErrorTestSuites ?? 0),
    skipped: report.numPendingTests + (report.numTodoTests ?? 0),
  };
}

function countPlaywright(path: string): Pick<SuiteResult, 'passed' | 'failed' | 'skipped'> | undefined {
  const report = readJson(path) as
    { stats: { expected: number; unexpected: number; flaky: number; skipped: number }; errors?: unknown[] } | undefined;
  if (!report) return undefined;
  return {
    passed: report.stats.expected + report.stats.flaky,
    failed: report.stats.unexpected + (report.errors?.length ?? 0),
    skipped: report.stats.skipped,
  };
}

async function suite(
  name: string,
  command: string[],
  options: {
    env?: NodeJS.ProcessEnv;
    report?: string;
    count?: (path: string) => Pick<SuiteResult, 'passed' | 'failed' | 'skipped'> | undefined;
  } = {},
): Promise<void> {
  say(`--- ${name} ---`);
  const started = Date.now();
  const [cmd, ...args] = command as [string, ...string[]];
  const { code } = await run(cmd, args, { env: { ...process.env, ...options.env } });
  const seconds = (Date.now() - started) / 1000;
  const counted = options.report && options.count ? options.count(options.report) : undefined;
  if (counted) {
    // A runner that exits non-zero with no failed test (a crash, a compile error) still fails the run.
    const failed = code !== 0 && counted.failed === 0 ? 1 : counted.failed;
    results.push({
      name,
      ...counted,
      failed,
      seconds,
      note: code !== 0 && counted.failed === 0 ? `exited with ${code}` : undefined,
    });
  } else {
    results.push({
      name,
      passed: code === 0 ? 1 : 0,
      failed: code === 0 ? 0 : 1,
      skipped: 0,
      seconds,
      note: counted === undefined && options.report ? 'no report' : undefined,
    });
  }
}

function ensureChromium(): void {
  if (existsSync('/usr/bin/chromium')) return;
  say("Chromium is missing; installing Debian's chromium package for the browser tests ...");
  aptInstall(['chromium'], "The browser tests need Debian's Chromium at /usr/bin/chromium.");
}

async function main(): Promise<void> {
  rmSync(outputDir, { recursive: true, force: true });
  mkdirSync(outputDir, { recursive: true });
  ensureChromium();
  let serverUrl = process.env.DATABASE_URL;
  if (!serverUrl) {
    cluster = startCluster({
      name: 'postgres-test',
      port: Number(process.env.YARDCALL_TEST_PG_PORT ?? 54339),
      durable: false,
    });
    serverUrl = cluster.adminUrl();
  }
  const runId = `${Date.now().toString(36)}_${process.pid}`;
  const serverDb = `yardcall_test_${runId}`;
  const serverDbUrl = await freshDatabase(serverUrl, serverDb);

  await buildIfChanged('shared');
  await suite('lint', ['npm', 'run', 'lint']);
  await suite(
    'shared',
    [
      'npx',
      'vitest',
      'run',
      '--root',
      'shared',
      '--reporter=default',
      '--reporter=json',
      `--outputFile=${join(outputDir, 'shared.json')}`,
    ],
    {
      report: join(outputDir, 'shared.json'),
      count: countJestLike,
    },
  );
  await suite(
    'server',
    ['npm', 'test', '--workspace', 'server', '--', '--json', `--outputFile=${join(outputDir, 'server.json')}`],
    {
      env: { DATABASE_URL: serverDbUrl, NODE_ENV: 'test' },
      report: join(outputDir, 'server.json'),
      count: countJestLike,
    },
  );
  await suite(
    'client',
    [
      'npx',
      'vitest',
      'run',
      '--root',
      'client',
      '--reporter=default',
      '--reporter=json',
      `--outputFile=${join(outputDir, 'client.json')}`,
    ],
    {
      report: join(outputDir, 'client.json'),
      count: countJestLike,
    },
  );

  await Promise.all([buildIfChanged('server'), buildIfChanged('client')]);
  server = await startSeededServer(serverUrl, `yardcall_e2e_${runId}`);
  await suite('browser', ['npx', 'playwright', 'test', '--config', 'client/e2e/playwright.config.ts'], {
    env: {
      BASE_URL: server.url,
      DATABASE_URL: server.databaseUrl,
      PLAYWRIGHT_JSON_OUTPUT_NAME: join(outputDir, 'browser.json'),
    },
    report: join(outputDir, 'browser.json'),
    count: countPlaywright,
  });
  await server.stop();
  server = undefined;
  await dropDatabase(serverUrl, serverDb);
}

function printSummary(): number {
  const passed = results.reduce((sum, r) => sum + r.passed, 0);
  const failed = results.reduce((sum, r) => sum + r.failed, 0);
  const skipped = results.reduce((sum, r) => sum + r.skipped, 0);
  console.log('\nSuite      passed  failed  skipped  seconds');
  for (const r of results) {
    console.log(
      `${r.name.padEnd(10)} ${String(r.passed).padStart(6)}  ${String(r.failed).padStart(6)}  ${String(r.skipped).padStart(7)}  ${r.seconds.toFixed(1).padStart(7)}${r.note ? `  (${r.note})` : ''}`,
    );
  }
  console.log(`\nWhole run: ${((Date.now() - startedAt) / 1000).toFixed(0)} s. Screenshots and reports: .test-output/`);
  console.log(`Summary: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
  return failed > 0 || results.length === 0 ? 1 : 0;
}

let exitCode: number;
try {
  await main();
  exitCode = printSummary();
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  results.push({ name: 'setup', passed: 0, failed: 1, skipped: 0, seconds: 0, note: 'set-up failed' });
  printSummary();
  exitCode = 1;
} finally {
  await server?.stop();
  cluster?.stop();
}
process.exit(exitCode);
