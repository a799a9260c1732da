// A PostgreSQL from Debian's packages, run by the project itself on 127.0.0.1 with its data inside
// the project (or, when the postgres user cannot reach it, in a folder it can).
import { existsSync, mkdirSync, readdirSync, chownSync, statSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { dirname, join, resolve } from 'node:path';
import pg from 'pg';
import { aptInstall, isRoot, projectRoot, runQuiet } from './run.js';
import { say } from './log.js';

export interface PostgresCluster {
  port: number;
  dataDir: string;
  started: boolean;
  adminUrl(database?: string): string;
  stop(): void;
}

function findBinDir(): string | undefined {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return undefined;
  const versions = readdirSync(base)
    .filter((name) => existsSync(join(base, name, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? join(base, versions[0], 'bin') : undefined;
}

export function ensurePostgresInstalled(): string {
  let bin = findBinDir();
  if (!bin) {
    say("PostgreSQL server binaries are missing; installing Debian's postgresql package ...");
    aptInstall(['postgresql'], 'PostgreSQL server binaries (initdb, pg_ctl) are missing.');
    bin = findBinDir();
    if (!bin) throw new Error('PostgreSQL was installed but initdb was not found under /usr/lib/postgresql/*/bin.');
  }
  return bin;
}

function ensurePostgresUser(): void {
  if (runQuiet('id', ['-u', 'postgres']).code !== 0) {
    runQuiet('useradd', ['--system', '--home-dir', '/var/lib/postgresql', '--shell', '/bin/bash', 'postgres']);
  }
}

// As root, the server runs as the postgres user, which must be able to traverse every parent folder.
function reachableByPostgres(path: string): boolean {
  for (let dir = resolve(path); ; dir = dirname(dir)) {
    if (existsSync(dir) && runQuiet('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).code !== 0) return false;
    if (dir === dirname(dir)) return true;
  }
}

function asServerUser(bin: string, tool: string, args: string[]) {
  const command = join(bin, tool);
  return isRoot() ? runQuiet('runuser', ['-u', 'postgres', '--', command, ...args]) : runQuiet(command, args);
}

function chooseDataDir(name: string): string {
  const inside = join(projectRoot, '.data', name);
  if (!isRoot()) return inside;
  mkdirSync(join(projectRoot, '.data'), { recursive: true });
  if (reachableByPostgres(join(projectRoot, '.data'))) return inside;
  const id = createHash('sha256').update(projectRoot).digest('hex').slice(0, 8);
  const fallback = join('/var/tmp', `yardcall-${id}`, name);
  say(
    `The postgres user cannot reach ${inside} (a parent folder is closed to it); keeping the database in ${fallback} instead.`,
  );
  return fallback;
}

export interface ClusterOptions {
  name: string;
  port: number;
  // Throw-away clusters (tests) trade durability for speed; never for data a user keeps.
  durable: boolean;
}

export function startCluster({ name, port, durable }: ClusterOptions): PostgresCluster {
  const bin = ensurePostgresInstalled();
  if (isRoot()) ensurePostgresUser();
  const home = chooseDataDir(name);
  const dataDir = join(home, 'data');
  const socketDir = join(home, 'socket');
  const logFile = join(home, 'postgres.log');
  for (const dir of [home, socketDir]) mkdirSync(dir, { recursive: true });
  if (isRoot()) {
    const pgUid = Number(runQuiet('id', ['-u', 'postgres']).output.trim());
    const pgGid = Number(runQuiet('id', ['-g', 'postgres']).output.trim());
    for (const dir of [home, socketDir]) chownSync(dir, pgUid, pgGid);
    if (existsSync(dataDir) && statSync(dataDir).uid !== pgUid) {
      throw new Error(`${dataDir} belongs to another user; remove it or give it to postgres.`);
    }
  }
  if (!existsSync(join(dataDir, 'PG_VERSION'))) {
    say(`Creating a PostgreSQL cluster in ${dataDir} ...`);
    const init = asServerUser(bin, 'initdb', [
      '-D',
      dataDir,
      '-U',
      'postgres',
      '--auth=trust',
      '-E',
      'UTF8',
      '--locale=C.UTF-8',
    ]);
    if (init.code !== 0) throw new Error(`initdb failed:\n${init.output}`);
  }
  const adminUrl = (database = 'postgres') => `postgres://postgres@127.0.0.1:${port}/${database}`;
  const status = asServerUser(bin, 'pg_ctl', ['-D', dataDir, 'status']);
  let started = false;
  if (status.code === 0) {
    say(`PostgreSQL is already running from ${dataDir}; using it.`);
  } else {
    const settings = [`-p ${port}`, `-k ${socketDir}`, '-c listen_addresses=127.0.0.1'];
    if (!durable) settings.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off');
    const start = asServerUser(bin, 'pg_ctl', [
      '-D',
      dataDir,
      '-l',
      logFile,
      '-w',
      '-t',
      '60',
      '-o',
      settings.join(' '),
      'start',
    ]);
    if (start.code !== 0) {
      throw new Error(
        `PostgreSQL did not start on 127.0.0.1:${port} (is the port taken? set YARDCALL_PG_PORT). Its log: ${logFile}\n${start.output}`,
      );
    }
    started = true;
    say(`PostgreSQL started on 127.0.0.1:${port}.`);
  }
  return {
    port,
    dataDir,
    started,
    adminUrl,
    stop() {
      if (!started) return;
      asServerUser(bin, 'pg_ctl', ['-D', dataDir, '-m', 'fast', '-w', 'stop']);
      started = false;
      say('PostgreSQL stopped.');
    },
  };
}

export async function withClient<T>(url: string, work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

function quoteIdent(name: string): string {
  return `"${name.replace(/"/g, '""')}"`;
}

// Points a server URL at another database on the same server.
export function databaseUrl(serverUrl: string, database: string): string {
  const url = new URL(serverUrl);
  url.pathname = `/${database}`;
  return url.toString();
}

export async function ensureDatabase(serverUrl: string, database: string): Promise<void> {
  await withClient(databaseUrl(serverUrl, 'postgres'), async (client) => {
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [database]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE ${quoteIdent(database)}`);
  });
}

export async function recreateDatabase(serverUrl: string, database: string): Promise<void> {
  await withClient(databaseUrl(serverUrl, 'postgres'), async (client) => {
    await client.query(`DROP DATABASE IF EXISTS ${quoteIdent(database)} WITH (FORCE)`);
    await client.query(`CREATE DATABASE ${quoteIdent(database)}`);
  });
}

export async function dropDatabase(serverUrl: string, database: string): Promise<void> {
  await withClient(databaseUrl(serverUrl, 'postgres'), (client) =>
    client.query(`DROP DATABASE IF EXISTS ${quoteIdent(database)} WITH (FORCE)`),
  );
}
