// Repairs one flaw of ncc's CommonJS output, used by the action's bundle (a build step).
//
// For CommonJS output ncc replaces `import.meta.url` with `require("url").pathToFileURL(__filename).href`.
// A module that declares its own `require` and `__filename` (an ES module emulating CommonJS, as
// @azure/storage-common's crc64.js does: `let require; ... require = createRequire(import.meta.url)`)
// then has the inserted `require` and `__filename` renamed to its own variables, which are still
// undefined at that point: `crc64_require is not a function` on every artifact upload. The inserted
// code meant the bundle file's own CommonJS `require` and `__filename`, so that is what this puts back.
//
// Only the exact shape webpack leaves behind is touched: `<name>_require("url").pathToFileURL(<name>_filename).href`
// with the same <name> twice (quotes of any kind, as the minifier may change them).

const RENAMED = /\b([A-Za-z_$][\w$]*)_require\((["'`])url\2\)\.pathToFileURL\(\1_filename\)\.href/g;

/**
 * @returns the repaired text and how many places were repaired.
 * @example shadowedImportMeta('a=crc64_require(`url`).pathToFileURL(crc64_filename).href').text
 *   // 'a=require("url").pathToFileURL(__filename).href'
 */
export function shadowedImportMeta(text) {
  let repaired = 0;
  const out = text.replace(RENAMED, () => {
    repaired += 1;
    return 'require("url").pathToFileURL(__filename).href';
  });
  return { text: out, repaired };
}
