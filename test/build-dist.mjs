// Builds the committed bundles: dist/cli (the `bellgate` command) and dist/index.cjs (the action).
// Usage: node test/build-dist.mjs [OUTDIR]   (default: dist). The check-dist test builds into a
// temporary folder and compares, so dist/ can never drift from src/.
import { execFileSync } from 'node:child_process';
import {
  mkdirSync,
  rmSync,
  renameSync,
  existsSync,
  readdirSync,
  readFileSync,
  writeFileSync,
  copyFileSync,
} from 'node:fs';
import { join, resolve } from 'node:path';
import { minifySync } from 'rolldown/utils';
import { eagerFactories } from './eager-factories.mjs';
import { shadowedImportMeta } from './shadowed-import-meta.mjs';

const root = resolve(new URL('..', import.meta.url).pathname);
const out = resolve(process.argv[2] ?? join(root, 'dist'));
const ncc = join(root, 'node_modules', '@vercel', 'ncc', 'dist', 'ncc', 'cli.js');

function bundle(entry, dir) {
  rmSync(dir, { recursive: true, force: true });
  execFileSync(
    process.execPath,
    [ncc, 'build', entry, '-o', dir, '--target', 'es2022', '--quiet', '--no-source-map-register'],
    {
      cwd: root,
      stdio: 'inherit',
    },
  );
}

mkdirSync(out, { recursive: true });
bundle(join(root, 'src', 'cli.ts'), join(out, 'cli'));
const actionTmp = join(out, '.action-tmp');
bundle(join(root, 'src', 'action.cjs'), actionTmp);
// The action's entry is dist/index.cjs (action.yml, CommonJS: src/action.cjs); its chunks
// (N.index.cjs.js) sit beside it.
for (const name of readdirSync(out)) {
  if (name !== 'cli' && name !== '.action-tmp') rmSync(join(out, name), { recursive: true, force: true });
}
for (const name of readdirSync(actionTmp)) renameSync(join(actionTmp, name), join(out, name));
rmSync(actionTmp, { recursive: true, force: true });
// Start-up is mostly parsing these files (V8 scans every byte of a chunk it loads), so each one
// loses its comments and indentation. Names and statements are left as they are (no mangling, no
// compression): behaviour and stack frames stay those of the source; legal comments are kept.
// oxc's minifier comes with vite (rolldown, pinned by package-lock.json); its output is
// deterministic, so a fresh build still equals the committed dist/ byte for byte. Then the module
// factories become plain functions, which V8 compiles once instead of twice (eager-factories.mjs).
for (const name of readdirSync(out).filter((f) => /\.c?js$/.test(f))) stripFile(join(out, name), false);
for (const name of readdirSync(join(out, 'cli')).filter((f) => f.endsWith('.js')))
  stripFile(join(out, 'cli', name), true);
// The CLI is ES modules ("type": "module" sources), the action CommonJS (a .cjs entry); each
// folder says which, so plain `node` loads its files the right way.
writeFileSync(join(out, 'package.json'), '{ "type": "commonjs" }\n');
writeFileSync(join(out, 'cli', 'package.json'), '{ "type": "module" }\n');
if (existsSync(join(root, 'src', 'config', 'bellgate.schema.json'))) {
  copyFileSync(join(root, 'src', 'config', 'bellgate.schema.json'), join(out, 'bellgate.schema.json'));
}

/**
 * Rewrites a bundle file (ES module or CommonJS) without comments and whitespace, with eager
 * factories and, in CommonJS, ncc's `import.meta.url` stand-in repaired (shadowed-import-meta.mjs),
 * keeping a leading `#!` line.
 */
function stripFile(path, esModule) {
  const text = readFileSync(path, 'utf8');
  const shebang = text.startsWith('#!') ? text.slice(0, text.indexOf('\n') + 1) : '';
  const result = minifySync(path, text.slice(shebang.length), {
    module: esModule,
    compress: false,
    mangle: false,
    codegen: { removeWhitespace: true, legalComments: 'inline' },
  });
  if (result.errors.length > 0) throw new Error(`cannot strip ${path}: ${result.errors[0].message}`);
  const code = esModule ? result.code : shadowedImportMeta(result.code).text;
  writeFileSync(path, shebang + eagerFactories(path, code, esModule ? 'module' : 'script').text);
}
