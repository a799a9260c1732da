// Builds each workspace only when its inputs changed since the last build, so a second
// `npm start` with nothing changed skips straight to serving.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync, statSync, writeFileSync, mkdirSync } from 'node:fs';
import { join, relative } from 'node:path';
import { projectRoot, run } from './run.js';
import { say } from './log.js';

type Workspace = 'shared' | 'client' | 'server';

const INPUTS: Record<Workspace, string[]> = {
  shared: ['shared/src', 'shared/package.json', 'shared/tsconfig.json', 'shared/tsconfig.build.json', 'prompts'],
  client: [
    'client/src',
    'client/public',
    'client/index.html',
    'client/driver-run',
    'client/vite.config.ts',
    'client/tsconfig.json',
    'client/package.json',
  ],
  server: [
    'server/src',
    'server/package.json',
    'server/tsconfig.json',
    'server/tsconfig.build.json',
    'server/nest-cli.json',
  ],
};
const DEPENDS_ON: Record<Workspace, Workspace[]> = { shared: [], client: ['shared'], server: ['shared'] };
const SKIPPED = new Set(['node_modules', 'dist', 'e2e']);

function hashInto(hash: ReturnType<typeof createHash>, path: string): void {
  const absolute = join(projectRoot, path);
  if (!existsSync(absolute)) return;
  const stat = statSync(absolute);
  if (stat.isDirectory()) {
    for (const entry of readdirSync(absolute).sort()) {
      if (!SKIPPED.has(entry)) hashInto(hash, join(path, entry));
    }
    return;
  }
  hash.update(relative(projectRoot, absolute)).update(readFileSync(absolute));
}

function inputHash(workspace: Workspace): string {
  const hash = createHash('sha256');
  for (const dependency of DEPENDS_ON[workspace]) hash.update(inputHash(dependency));
  for (const path of INPUTS[workspace]) hashInto(hash, path);
  return hash.digest('hex');
}

export async function buildIfChanged(workspace: Workspace): Promise<void> {
  const stampPath = join(projectRoot, workspace, 'dist', '.yardcall-build-stamp');
  const wanted = inputHash(workspace);
  if (existsSync(stampPath) && readFileSync(stampPath, 'utf8').trim() === wanted) {
    say(`${workspace}: up to date.`);
    return;
  }
  say(`${workspace}: building ...`);
  const started = Date.now();
  const result = await run('npm', ['run', 'build', '--workspace', workspace]);
  if (result.code !== 0) throw new Error(`The ${workspace} build failed (see above).`);
  mkdirSync(join(projectRoot, workspace, 'dist'), { recursive: true });
  writeFileSync(stampPath, wanted + '\n');
  say(`${workspace}: built in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}
