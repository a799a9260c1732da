// First step of `npm start`, `npm test` and `npm run bench`: plain Node, no packages, because it
// installs them. Checks the Node version and (re)installs node_modules when missing or stale.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';

const root = new URL('..', import.meta.url).pathname;
const [major, minor] = process.versions.node.split('.').map(Number);
if (major < 20 || (major === 20 && minor < 19)) {
  console.error(
    `Yardcall needs Node.js 20.19 or newer; this is ${process.versions.node}. Install a newer Node.js 20 and try again.`,
  );
  process.exit(1);
}

const manifests = [
  'package-lock.json',
  'package.json',
  'prompts/package.json',
  'shared/package.json',
  'server/package.json',
  'client/package.json',
];
const hash = createHash('sha256');
for (const file of manifests) {
  const path = join(root, file);
  if (existsSync(path)) hash.update(file).update(readFileSync(path));
}
const wanted = hash.digest('hex');
const stampPath = join(root, 'node_modules', '.yardcall-install-stamp');
const current = existsSync(stampPath) ? readFileSync(stampPath, 'utf8').trim() : '';

if (current !== wanted) {
  const fresh = !existsSync(join(root, 'node_modules'));
  const args = fresh && existsSync(join(root, 'package-lock.json')) ? ['ci'] : ['install'];
  console.log(`[yardcall] ${fresh ? 'Installing' : 'Updating'} packages (npm ${args[0]}) ...`);
  const started = Date.now();
  const result = spawnSync('npm', [...args, '--no-audit', '--no-fund', '--loglevel=error'], {
    cwd: root,
    stdio: 'inherit',
  });
  if (result.status !== 0) {
    console.error(
      '[yardcall] npm could not install the packages (see above). Check the network to the npm registry and run the command again.',
    );
    process.exit(result.status ?? 1);
  }
  // npm may rewrite the lock file; stamp what is there now.
  const after = createHash('sha256');
  for (const file of manifests) {
    const path = join(root, file);
    if (existsSync(path)) after.update(file).update(readFileSync(path));
  }
  writeFileSync(stampPath, after.digest('hex') + '\n');
  console.log(`[yardcall] Packages ready in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}
