import { rolldown } from 'rolldown';

/**
 * Bundles a TypeScript entry (and what it imports from src/) into one ES module file that plain
 * `node` runs, so a test can start real processes of the project's own code. rolldown comes with
 * vite (a devDependency); node: modules and npm packages stay imports of the bundle.
 * @example await bundleScript('test/history/workers/file-writer.ts', '/tmp/x/file-writer.mjs')
 */
export async function bundleScript(entry: string, outFile: string): Promise<void> {
  const bundle = await rolldown({
    input: entry,
    platform: 'node',
    external: (id) => id.startsWith('node:') || !/^[./]/.test(id),
    logLevel: 'silent',
  });
  try {
    await bundle.write({ file: outFile, format: 'esm' });
  } finally {
    await bundle.close();
  }
}
