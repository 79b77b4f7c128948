import { basename, join } from 'node:path';
import { rolldown } from 'rolldown';

/**
 * Bundles a TypeScript entry, with what it imports from src/ and node_modules, into `outDir`, so
 * a test can start real processes of the project's own code with plain `node`. rolldown comes with
 * vite (a devDependency). Returns the path of the entry file (`<entry name>.mjs`).
 * @example const script = await bundleScript('test/history/workers/file-writer.ts', '/tmp/x')
 */
export async function bundleScript(entry: string, outDir: string): Promise<string> {
  const bundle = await rolldown({
    input: entry,
    platform: 'node',
    external: (id) => id.startsWith('node:'),
    logLevel: 'silent',
  });
  try {
    await bundle.write({
      dir: outDir,
      format: 'esm',
      entryFileNames: '[name].mjs',
      chunkFileNames: '[name]-[hash].mjs',
    });
  } finally {
    await bundle.close();
  }
  return join(outDir, `${basename(entry).replace(/\.ts$/, '')}.mjs`);
}
