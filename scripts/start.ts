// `npm start`: PostgreSQL, migrations, demo seed, builds, and the server, all on 127.0.0.1.
import type { ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildIfChanged } from './lib/build.js';
import { DEMO_PASSWORD, DEMO_SIGN_INS } from './lib/demo.js';
import { fail, say } from './lib/log.js';
import { databaseUrl, ensureDatabase, startCluster, type PostgresCluster } from './lib/postgres.js';
import { projectRoot, run, stopChild } from './lib/run.js';
import { serverScript, startServer } from './lib/server.js';

const started = Date.now();
const port = Number(process.env.PORT ?? 3000);
const pgPort = Number(process.env.YARDCALL_PG_PORT ?? 54329);
let cluster: PostgresCluster | undefined;
let server: ChildProcess | undefined;
let stopping = false;

async function shutdown(code: number): Promise<never> {
  if (!stopping) {
    stopping = true;
    say('Stopping ...');
    await stopChild(server);
    cluster?.stop();
  }
  process.exit(code);
}

process.on('SIGINT', () => void shutdown(0));
process.on('SIGTERM', () => void shutdown(0));

// Sign-in tokens stay valid across restarts: the secret is made once and kept with the data.
function jwtSecret(): string {
  if (process.env.JWT_SECRET) return process.env.JWT_SECRET;
  const path = join(projectRoot, '.data', 'jwt-secret');
  if (!existsSync(path)) {
    mkdirSync(join(projectRoot, '.data'), { recursive: true });
    writeFileSync(path, randomBytes(48).toString('base64url') + '\n', { mode: 0o600 });
  }
  return readFileSync(path, 'utf8').trim();
}

async function main(): Promise<void> {
  let url = process.env.DATABASE_URL;
  if (url) {
    say('Using the PostgreSQL in DATABASE_URL.');
  } else {
    cluster = startCluster({ name: 'postgres', port: pgPort, durable: true });
    await ensureDatabase(cluster.adminUrl(), 'yardcall');
    url = databaseUrl(cluster.adminUrl(), 'yardcall');
  }
  await buildIfChanged('shared');
  await Promise.all([buildIfChanged('server'), buildIfChanged('client')]);
  const env = { ...process.env, DATABASE_URL: url };
  for (const script of ['migrate', 'seed'] as const) {
    const result = await run('npm', serverScript(script), { env });
    if (result.code !== 0) throw new Error(`npm run ${script} failed (see above).`);
  }
  const running = await startServer({
    databaseUrl: url,
    port,
    env: { JWT_SECRET: jwtSecret(), PUBLIC_URL: process.env.PUBLIC_URL ?? `http://127.0.0.1:${port}` },
  });
  server = running.child;
  server.on('exit', (code) => {
    if (!stopping) {
      say(`The server stopped (code ${code}).`);
      void shutdown(code ?? 1);
    }
  });
  const width = Math.max(...DEMO_SIGN_INS.map((entry) => entry.role.length));
  console.log(
    [
      '',
      `Yardcall is ready at ${running.url}  (in ${((Date.now() - started) / 1000).toFixed(1)} s)`,
      '',
      `Demo sign-ins (password: ${DEMO_PASSWORD}):`,
      ...DEMO_SIGN_INS.map((entry) => `  ${entry.role.padEnd(width)}  ${entry.email}`),
      '',
      `API docs: ${running.url}/api/docs    Caught e-mails (admin): ${running.url}/admin/outbox`,
      'Press Ctrl-C to stop the server and PostgreSQL.',
      '',
    ].join('\n'),
  );
}

main().catch(async (error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  await stopChild(server);
  cluster?.stop();
  fail('npm start did not finish; see the message above.');
});
