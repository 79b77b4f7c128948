/**
 * Reads the history file out of a downloaded artifact zip, refusing anything that looks hostile:
 * too many entries, entries that would leave their folder (`../`, absolute or drive paths), and
 * declared or actual unzipped sizes over the cap (a zip bomb). Unzipping is fflate's.
 */
import { unzipSync } from 'fflate';

export interface ZipLimits {
  maxEntries: number;
  maxUnzippedBytes: number;
}

export const DEFAULT_ZIP_LIMITS: ZipLimits = { maxEntries: 16, maxUnzippedBytes: 64 * 1024 * 1024 };

/** Why a zip was refused; the artifact store turns it into a warning and skips the artifact. */
export class ZipRefusedError extends Error {
  override name = 'ZipRefusedError';
}

/** True when an entry name would be written outside the folder it is unpacked into. */
export function leavesFolder(name: string): boolean {
  const n = name.replace(/\\/g, '/');
  if (n.startsWith('/') || /^[A-Za-z]:/.test(n)) return true;
  return n.split('/').some((part) => part === '..');
}

/**
 * Returns the text of entry `fileName` (at the zip's root) from `bytes`.
 * @throws ZipRefusedError when the zip is corrupt, hostile, too big or lacks the file.
 * @example readZipEntry(zipSync({ 'history.json': strToU8('{}') }), 'history.json') // '{}'
 */
export function readZipEntry(bytes: Uint8Array, fileName: string, limits: ZipLimits = DEFAULT_ZIP_LIMITS): string {
  let entries = 0;
  let declared = 0;
  let hostile: string | undefined;
  let files: Record<string, Uint8Array>;
  try {
    files = unzipSync(bytes, {
      filter: (file) => {
        entries += 1;
        declared += file.originalSize;
        if (leavesFolder(file.name)) hostile ??= file.name;
        // Only the one file we need is inflated; the rest are counted, not unpacked.
        return file.name === fileName && file.originalSize <= limits.maxUnzippedBytes;
      },
    });
  } catch (cause) {
    throw new ZipRefusedError(`not a readable zip (${cause instanceof Error ? cause.message : String(cause)})`);
  }
  if (hostile !== undefined) throw new ZipRefusedError(`entry "${hostile}" would leave its folder`);
  if (entries > limits.maxEntries)
    throw new ZipRefusedError(`${entries} entries, more than the ${limits.maxEntries} allowed`);
  if (declared > limits.maxUnzippedBytes) {
    throw new ZipRefusedError(`unzips to ${declared} bytes, more than the ${limits.maxUnzippedBytes} allowed`);
  }
  const data = files[fileName];
  if (data === undefined) throw new ZipRefusedError(`no ${fileName} in the zip`);
  if (data.length > limits.maxUnzippedBytes) throw new ZipRefusedError(`${fileName} unzips beyond the size cap`);
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(data);
  } catch {
    throw new ZipRefusedError(`${fileName} is not UTF-8 text`);
  }
}
