// Builds the committed bundles: dist/cli (the `bellgate` command) and dist/index.js (the action).
// Usage: node test/build-dist.mjs [OUTDIR]   (default: dist). The check-dist test builds into a
// temporary folder and compares, so dist/ can never drift from src/.
import { execFileSync } from 'node:child_process';
import { mkdirSync, rmSync, renameSync, existsSync, readdirSync, writeFileSync, copyFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

const root = resolve(new URL('..', import.meta.url).pathname);
const out = resolve(process.argv[2] ?? join(root, 'dist'));
const ncc = join(root, 'node_modules', '@vercel', 'ncc', 'dist', 'ncc', 'cli.js');

function bundle(entry, dir) {
  rmSync(dir, { recursive: true, force: true });
  execFileSync(process.execPath, [ncc, 'build', entry, '-o', dir, '--target', 'es2022', '--quiet', '--no-source-map-register'], {
    cwd: root,
    stdio: 'inherit',
  });
}

mkdirSync(out, { recursive: true });
bundle(join(root, 'src', 'cli.ts'), join(out, 'cli'));
const actionTmp = join(out, '.action-tmp');
bundle(join(root, 'src', 'action.ts'), actionTmp);
// The action's entry is dist/index.js (action.yml); its chunks sit beside it.
for (const name of readdirSync(out)) {
  if (name !== 'cli' && name !== '.action-tmp') rmSync(join(out, name), { recursive: true, force: true });
}
for (const name of readdirSync(actionTmp)) renameSync(join(actionTmp, name), join(out, name));
rmSync(actionTmp, { recursive: true, force: true });
// ncc emits ESM for "type": "module" sources; mark the folders so plain `node` loads them as ESM.
for (const dir of [out, join(out, 'cli')]) writeFileSync(join(dir, 'package.json'), '{ "type": "module" }\n');
if (existsSync(join(root, 'src', 'config', 'bellgate.schema.json'))) {
  copyFileSync(join(root, 'src', 'config', 'bellgate.schema.json'), join(out, 'bellgate.schema.json'));
}
