// A throw-away PostgreSQL database, migrated and seeded, and the built server on a free port:
// what the browser tests and the benchmarks run against.
import { createServer } from 'node:net';
import { dropDatabase, databaseUrl, recreateDatabase } from './postgres.js';
import { run, stopChild } from './run.js';
import { serverScript, startServer, type RunningServer } from './server.js';

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() =>
        typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no free port')),
      );
    });
  });
}

export async function freshDatabase(serverUrl: string, name: string): Promise<string> {
  await recreateDatabase(serverUrl, name);
  return databaseUrl(serverUrl, name);
}

export async function migrateAndSeed(url: string): Promise<void> {
  for (const script of ['migrate', 'seed'] as const) {
    const result = await run('npm', serverScript(script), { env: { ...process.env, DATABASE_URL: url } });
    if (result.code !== 0) throw new Error(`npm run ${script} failed for ${new URL(url).pathname.slice(1)}.`);
  }
}

export interface SeededServer extends RunningServer {
  databaseUrl: string;
  stop(): Promise<void>;
}

// The server in test mode (its own JWT secret, sign-in throttle relaxed for many test sign-ins).
export async function startSeededServer(serverUrl: string, database: string): Promise<SeededServer> {
  const url = await freshDatabase(serverUrl, database);
  await migrateAndSeed(url);
  const server = await startServer({
    databaseUrl: url,
    port: await freePort(),
    quiet: true,
    env: { NODE_ENV: 'test', THROTTLE_LOGIN_LIMIT: '1000', JWT_SECRET: 'yardcall-local-test-secret-0123456789abcdef' },
  });
  return {
    ...server,
    databaseUrl: url,
    async stop() {
      await stopChild(server.child);
      await dropDatabase(serverUrl, database);
    },
  };
}
