import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
// @ts-expect-error: a plain .mjs build helper without types
import { shadowedImportMeta } from './shadowed-import-meta.mjs';

const repair = shadowedImportMeta as (text: string) => { text: string; repaired: number };

// The shape ncc leaves in @azure/storage-common's crc64.js when bundling for CommonJS (seen in
// dist/488.index.cjs.js before the repair): the stand-in for import.meta.url uses the module's own,
// still undefined, `require` and `__filename`.
const BROKEN =
  'const external_node_module_=require("node:module");let crc64_require;let crc64_filename;' +
  'crc64_require=(0,external_node_module_.createRequire)(crc64_require(`url`).pathToFileURL(crc64_filename).href);' +
  'crc64_filename=require("node:url").fileURLToPath(crc64_require(`url`).pathToFileURL(crc64_filename).href);' +
  'return { path: crc64_require("node:path").sep, file: crc64_filename };';

/** Runs text as the body of a CommonJS module at `file` (its own require and __filename). */
function runAsCommonJs(text: string, file: string): unknown {
  return new Function('require', '__filename', text)(createRequire(file), file);
}

describe('shadowedImportMeta (build step for the CommonJS action bundle)', () => {
  it('the broken shape fails as it did on upload, and runs once repaired', () => {
    const file = '/tmp/bundle/488.index.cjs.js';
    expect(() => runAsCommonJs(BROKEN, file)).toThrow(/crc64_require is not a function/);
    const fixed = repair(BROKEN);
    expect(fixed.repaired).toBe(2);
    expect(runAsCommonJs(fixed.text, file)).toEqual({ path: '/', file });
  });

  it('leaves everything else alone: other quotes are repaired, mismatched names are not', () => {
    expect(repair('x=a_require("url").pathToFileURL(a_filename).href').text).toBe(
      'x=require("url").pathToFileURL(__filename).href',
    );
    const mismatched =
      'x=a_require(`url`).pathToFileURL(b_filename).href;y=require("url").pathToFileURL(__filename).href';
    expect(repair(mismatched)).toEqual({ text: mismatched, repaired: 0 });
  });
});
