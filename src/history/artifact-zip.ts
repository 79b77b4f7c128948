/**
 * Reads named files out of a downloaded artifact zip, refusing anything hostile before it costs
 * time or memory: the entry count and the central directory are checked against the end record
 * (APPNOTE.TXT 4.3.16, and the ZIP64 end record 4.3.14) before any entry is looked at; entries that
 * would leave their folder (`../`, absolute or drive paths), encrypted entries and methods other
 * than stored (0) and deflate (8) are refused; the declared sizes are summed against the cap before
 * anything is inflated; inflating stops as soon as an entry passes its declared size (node:zlib's
 * maxOutputLength), and a shorter entry, or one whose CRC-32 differs, is refused too.
 */
import { crc32, inflateRawSync } from 'node:zlib';

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

const EOCD = 0x06054b50;
const ZIP64_LOCATOR = 0x07064b50;
const ZIP64_EOCD = 0x06064b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;

interface CentralEntry {
  name: string;
  method: number;
  crc: number;
  compressed: number;
  size: number;
  localOffset: number;
}

/**
 * The texts of the entries named `wanted` (at the zip's root) that the zip holds, by name.
 * @throws ZipRefusedError when the zip is corrupt, hostile, too big, or an entry is not UTF-8.
 * @example readZipEntries(zipSync({ 'history.jsonl': strToU8('{}\n') }), ['history.jsonl']).get('history.jsonl') // '{}\n'
 */
export function readZipEntries(
  bytes: Uint8Array,
  wanted: readonly string[],
  limits: ZipLimits = DEFAULT_ZIP_LIMITS,
): Map<string, string> {
  const buf = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const entries = centralDirectory(buf, limits);
  let declared = 0;
  for (const e of entries) {
    if (leavesFolder(e.name)) throw new ZipRefusedError(`entry "${e.name}" would leave its folder`);
    declared += e.size;
  }
  if (declared > limits.maxUnzippedBytes)
    throw new ZipRefusedError(
      `it declares ${declared} unzipped bytes, more than the ${limits.maxUnzippedBytes} allowed`,
    );
  const out = new Map<string, string>();
  for (const e of entries) {
    if (!wanted.includes(e.name) || out.has(e.name)) continue;
    const data = inflateEntry(buf, e);
    try {
      out.set(e.name, new TextDecoder('utf-8', { fatal: true }).decode(data));
    } catch {
      throw new ZipRefusedError(`${e.name} is not UTF-8 text`);
    }
  }
  return out;
}

/** Returns the text of entry `fileName`; throws ZipRefusedError when it is missing (see readZipEntries). */
export function readZipEntry(bytes: Uint8Array, fileName: string, limits: ZipLimits = DEFAULT_ZIP_LIMITS): string {
  const text = readZipEntries(bytes, [fileName], limits).get(fileName);
  if (text === undefined) throw new ZipRefusedError(`no ${fileName} in the zip`);
  return text;
}

function centralDirectory(buf: Buffer, limits: ZipLimits): CentralEntry[] {
  // The end record is the last 22 bytes plus a comment of at most 65,535 bytes.
  let end = -1;
  for (let i = buf.length - 22; i >= Math.max(0, buf.length - 22 - 0xffff); i--) {
    if (buf.readUInt32LE(i) === EOCD) {
      end = i;
      break;
    }
  }
  if (end < 0) throw new ZipRefusedError('not a readable zip (no end of central directory record)');
  let count = buf.readUInt16LE(end + 10);
  let size = buf.readUInt32LE(end + 12);
  let offset = buf.readUInt32LE(end + 16);
  if (buf.readUInt16LE(end + 4) !== 0 || buf.readUInt16LE(end + 6) !== 0)
    throw new ZipRefusedError('a zip split over several disks is not read');
  if (count === 0xffff || size === 0xffffffff || offset === 0xffffffff) {
    const locator = end - 20;
    if (locator < 0 || buf.readUInt32LE(locator) !== ZIP64_LOCATOR)
      throw new ZipRefusedError('not a readable zip (a ZIP64 end record is announced but missing)');
    const at = Number(buf.readBigUInt64LE(locator + 8));
    if (!Number.isSafeInteger(at) || at < 0 || at + 56 > locator || buf.readUInt32LE(at) !== ZIP64_EOCD)
      throw new ZipRefusedError('not a readable zip (the ZIP64 end record is out of place)');
    const big = (n: bigint): number => (n > BigInt(Number.MAX_SAFE_INTEGER) ? Infinity : Number(n));
    count = big(buf.readBigUInt64LE(at + 32));
    size = big(buf.readBigUInt64LE(at + 40));
    offset = big(buf.readBigUInt64LE(at + 48));
    end = at;
  }
  if (count > limits.maxEntries)
    throw new ZipRefusedError(`it claims ${count} entries, more than the ${limits.maxEntries} allowed`);
  if (!(offset + size <= end)) throw new ZipRefusedError('not a readable zip (the central directory lies outside it)');
  const entries: CentralEntry[] = [];
  let at = offset;
  for (let i = 0; i < count; i++) {
    if (at + 46 > offset + size || buf.readUInt32LE(at) !== CENTRAL)
      throw new ZipRefusedError(`not a readable zip (central directory entry ${i + 1} is damaged)`);
    const flags = buf.readUInt16LE(at + 8);
    const nameLength = buf.readUInt16LE(at + 28);
    const next = at + 46 + nameLength + buf.readUInt16LE(at + 30) + buf.readUInt16LE(at + 32);
    if (next > offset + size)
      throw new ZipRefusedError(`not a readable zip (central directory entry ${i + 1} is cut short)`);
    const name = buf.toString((flags & 0x800) !== 0 ? 'utf8' : 'latin1', at + 46, at + 46 + nameLength);
    const entry: CentralEntry = {
      name,
      method: buf.readUInt16LE(at + 10),
      crc: buf.readUInt32LE(at + 16),
      compressed: buf.readUInt32LE(at + 20),
      size: buf.readUInt32LE(at + 24),
      localOffset: buf.readUInt32LE(at + 42),
    };
    if ((flags & 1) !== 0) throw new ZipRefusedError(`entry "${name}" is encrypted`);
    if (entry.size === 0xffffffff || entry.compressed === 0xffffffff || entry.localOffset === 0xffffffff)
      throw new ZipRefusedError(`entry "${name}" is a ZIP64 entry (over 4 GiB), which is not read`);
    entries.push(entry);
    at = next;
  }
  return entries;
}

function inflateEntry(buf: Buffer, e: CentralEntry): Buffer {
  const at = e.localOffset;
  if (at + 30 > buf.length || buf.readUInt32LE(at) !== LOCAL)
    throw new ZipRefusedError(`not a readable zip (the local header of "${e.name}" is missing)`);
  const start = at + 30 + buf.readUInt16LE(at + 26) + buf.readUInt16LE(at + 28);
  if (start + e.compressed > buf.length) throw new ZipRefusedError(`entry "${e.name}" runs past the end of the zip`);
  const raw = buf.subarray(start, start + e.compressed);
  let data: Buffer;
  if (e.method === 0) data = raw;
  else if (e.method === 8) {
    try {
      // Stops once the output passes the declared size (maxOutputLength must be at least 1).
      data = inflateRawSync(raw, { maxOutputLength: Math.max(1, e.size) });
    } catch (cause) {
      if ((cause as NodeJS.ErrnoException).code === 'ERR_BUFFER_TOO_LARGE')
        throw new ZipRefusedError(
          `entry "${e.name}" inflates past the ${e.size} bytes it declares; inflating stopped there`,
        );
      throw new ZipRefusedError(`entry "${e.name}" is not readable deflate data (${(cause as Error).message})`);
    }
  } else throw new ZipRefusedError(`entry "${e.name}" uses compression method ${e.method}, which is not read`);
  if (data.length !== e.size)
    throw new ZipRefusedError(`entry "${e.name}" holds ${data.length} bytes, not the ${e.size} it declares`);
  if (crc32(data) >>> 0 !== e.crc >>> 0) throw new ZipRefusedError(`entry "${e.name}" fails its CRC-32 check`);
  return data;
}
