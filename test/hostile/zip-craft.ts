// Hand-made zip files for the hostile zip cases, byte by byte after PKWARE's APPNOTE.TXT (4.3.7
// local file header, 4.3.12 central directory header, 4.3.14-4.3.16 the ZIP64 and plain end
// records). Only what the cases need: one deflated or stored entry, and end records that lie.
import { createDeflateRaw, crc32, deflateRawSync } from 'node:zlib';

const u16 = (n: number) => {
  const b = Buffer.alloc(2);
  b.writeUInt16LE(n);
  return b;
};
const u32 = (n: number) => {
  const b = Buffer.alloc(4);
  b.writeUInt32LE(n >>> 0);
  return b;
};
const u64 = (n: bigint) => {
  const b = Buffer.alloc(8);
  b.writeBigUInt64LE(n);
  return b;
};

export interface CraftedEntry {
  name: string;
  data: Buffer;
  /** The stored bytes as they are (already deflated), instead of deflating `data`. */
  body?: Buffer;
  /** Deflate (8) or store (0). */
  method?: 0 | 8;
  /** The uncompressed size the headers declare (default: the real one). */
  declaredSize?: number;
  /** The CRC-32 the headers declare (default: the real one). */
  declaredCrc?: number;
}

/** A zip of the entries, with a plain end record (its entry count may be overridden). */
export function craftZip(entries: CraftedEntry[], claimedCount?: number): Buffer {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const e of entries) {
    const method = e.method ?? 8;
    const body = e.body ?? (method === 8 ? deflateRawSync(e.data) : e.data);
    const crc = e.declaredCrc ?? crc32(e.data);
    const size = e.declaredSize ?? e.data.length;
    const name = Buffer.from(e.name, 'utf8');
    const common = [
      u16(20),
      u16(0x800),
      u16(method),
      u16(0),
      u16(0x21),
      u32(crc),
      u32(body.length),
      u32(size),
      u16(name.length),
      u16(0),
    ];
    const local = Buffer.concat([u32(0x04034b50), ...common, name, body]);
    centrals.push(
      Buffer.concat([u32(0x02014b50), u16(20), ...common, u16(0), u16(0), u16(0), u32(0), u32(offset), name]),
    );
    locals.push(local);
    offset += local.length;
  }
  const central = Buffer.concat(centrals);
  const count = claimedCount ?? entries.length;
  const end = Buffer.concat([
    u32(0x06054b50),
    u16(0),
    u16(0),
    u16(count),
    u16(count),
    u32(central.length),
    u32(offset),
    u16(0),
  ]);
  return Buffer.concat([...locals, central, end]);
}

/**
 * 98 bytes: an empty central directory whose ZIP64 end record claims `count` entries (56 bytes),
 * its locator (20) and a plain end record that defers to them (22).
 */
export function zip64Claiming(count: bigint): Buffer {
  const record = Buffer.concat([
    u32(0x06064b50),
    u64(44n),
    u16(45),
    u16(45),
    u32(0),
    u32(0),
    u64(count),
    u64(count),
    u64(0n),
    u64(0n),
  ]);
  const locator = Buffer.concat([u32(0x07064b50), u32(0), u64(0n), u32(1)]);
  const end = Buffer.concat([
    u32(0x06054b50),
    u16(0),
    u16(0),
    u16(0xffff),
    u16(0xffff),
    u32(0xffffffff),
    u32(0xffffffff),
    u16(0),
  ]);
  return Buffer.concat([record, locator, end]);
}

/** The raw deflate stream of `bytes` zero bytes, made in 1 MiB steps (memory stays small). */
export async function deflatedZeros(bytes: number): Promise<Buffer> {
  const deflate = createDeflateRaw({ level: 9 });
  const out: Buffer[] = [];
  deflate.on('data', (c: Buffer) => out.push(c));
  const done = new Promise((resolve) => deflate.on('end', resolve));
  const chunk = Buffer.alloc(1024 * 1024);
  for (let left = bytes; left > 0; left -= chunk.length) {
    if (!deflate.write(left >= chunk.length ? chunk : chunk.subarray(0, left)))
      await new Promise((r) => deflate.once('drain', r));
  }
  deflate.end();
  await done;
  return Buffer.concat(out);
}
