// Starts the built NestJS server as a child process and waits until it answers /api/health.
import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { projectRoot } from './run.js';

export interface ServerOptions {
  databaseUrl: string;
  port: number;
  host?: string;
  env?: Record<string, string>;
  quiet?: boolean;
}

export interface RunningServer {
  url: string;
  child: ChildProcess;
}

export async function startServer({
  databaseUrl,
  port,
  host = '127.0.0.1',
  env = {},
  quiet = false,
}: ServerOptions): Promise<RunningServer> {
  const child = spawn(process.execPath, [join(projectRoot, 'server', 'dist', 'main.js')], {
    cwd: join(projectRoot, 'server'),
    env: {
      ...process.env,
      NODE_ENV: process.env.NODE_ENV ?? 'production',
      DATABASE_URL: databaseUrl,
      PORT: String(port),
      HOST: host,
      CLIENT_DIST: join(projectRoot, 'client', 'dist'),
      ...env,
    },
    stdio: quiet ? ['ignore', 'ignore', 'inherit'] : 'inherit',
  });
  const url = `http://${host}:${port}`;
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null)
      throw new Error(`The server exited with code ${child.exitCode} before it was ready (see above).`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.ok) return { url, child };
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  child.kill('SIGTERM');
  throw new Error(`The server did not answer ${url}/api/health within 60 s.`);
}

export function serverScript(script: 'migrate' | 'seed'): string[] {
  return ['run', script, '--workspace', 'server'];
}
