import { spawn, spawnSync, type ChildProcess, type SpawnOptions } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const projectRoot = fileURLToPath(new URL('../..', import.meta.url));

export interface RunResult {
  code: number;
  output: string;
}

// Runs a command to completion, output shown as it comes (and kept when `capture` is set).
export function run(
  command: string,
  args: string[],
  options: SpawnOptions & { capture?: boolean } = {},
): Promise<RunResult> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, {
      cwd: projectRoot,
      stdio: options.capture ? ['ignore', 'pipe', 'pipe'] : 'inherit',
      ...options,
    });
    let output = '';
    child.stdout?.on('data', (chunk: Buffer) => {
      output += chunk.toString();
      process.stdout.write(chunk);
    });
    child.stderr?.on('data', (chunk: Buffer) => {
      output += chunk.toString();
      process.stderr.write(chunk);
    });
    child.on('error', reject);
    child.on('close', (code) => resolve({ code: code ?? 1, output }));
  });
}

export function runQuiet(command: string, args: string[], options: SpawnOptions = {}): RunResult {
  const result = spawnSync(command, args, { cwd: projectRoot, encoding: 'utf8', ...options });
  return { code: result.status ?? 1, output: `${result.stdout ?? ''}${result.stderr ?? ''}` };
}

export function isRoot(): boolean {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

export function commandExists(command: string): boolean {
  return runQuiet('sh', ['-c', `command -v ${command}`]).code === 0;
}

// Installs Debian packages when we may (root), once per process for the package index.
let aptUpdated = false;
export function aptInstall(packages: string[], why: string): void {
  if (!isRoot()) {
    throw new Error(`${why} Install it with: sudo apt-get install -y ${packages.join(' ')}`);
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    const update = spawnSync('apt-get', ['update'], { stdio: 'inherit', env });
    if (update.status !== 0) throw new Error('apt-get update failed: check the network to the Debian mirror.');
    aptUpdated = true;
  }
  const install = spawnSync('apt-get', ['install', '-y', '--no-install-recommends', ...packages], {
    stdio: 'inherit',
    env,
  });
  if (install.status !== 0) throw new Error(`apt-get could not install ${packages.join(' ')}.`);
}

export function stopChild(child: ChildProcess | undefined, signal: NodeJS.Signals = 'SIGTERM'): Promise<void> {
  if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill(signal);
  });
}
