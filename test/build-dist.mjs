// Builds the committed bundles: dist/index.js (the action, what action.yml runs) and dist/cli/
// (the `bellgate` command), one ncc call per entry, ES modules both.
// Usage: node test/build-dist.mjs [OUTDIR]   (default: dist). `.ci/run` builds into a temporary
// folder and compares it with dist/, so the committed bundle cannot drift from src/.
import { execFileSync } from 'node:child_process';
import { copyFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

const root = resolve(new URL('..', import.meta.url).pathname);
const out = resolve(process.argv[2] ?? join(root, 'dist'));
const ncc = join(root, 'node_modules', '@vercel', 'ncc', 'dist', 'ncc', 'cli.js');

function bundle(entry, dir) {
  execFileSync(
    process.execPath,
    [ncc, 'build', entry, '-o', dir, '--target', 'es2022', '--quiet', '--no-source-map-register'],
    { cwd: root, stdio: 'inherit' },
  );
}

rmSync(out, { recursive: true, force: true });
bundle(join(root, 'src', 'action.ts'), out);
bundle(join(root, 'src', 'cli.ts'), join(out, 'cli'));
// The bundles are ES modules; this says so to node wherever dist/ is copied without our package.json.
writeFileSync(join(out, 'package.json'), '{ "type": "module" }\n');
// The config schema ships beside the bundle for editors (the `$schema` line of a config).
copyFileSync(join(root, 'src', 'config', 'bellgate.schema.json'), join(out, 'bellgate.schema.json'));
