#!/usr/bin/env node
/**
 * The load of the "loaded" and "blocks" regimes of the noise corpus: one process keeping one core
 * busy with mixed work (sorting fresh arrays, hashing, building strings) so it competes for the
 * core, the caches and the memory bus, not only for cycles. It stops by itself after --seconds
 * (default 3 hours), so a recorder that dies cannot leave it running for ever.
 *   node test/noise/burn.mjs [--seconds N]
 */
import { createHash } from 'node:crypto';

const at = process.argv.indexOf('--seconds');
const seconds = at > 0 ? Number(process.argv[at + 1]) : 3 * 3600;
const end = Date.now() + seconds * 1000;
let sink = 0;
while (Date.now() < end) {
  const values = Float64Array.from({ length: 200_000 }, (_, i) => Math.sin(i * 12.9898 + sink) * 43758.5453);
  values.sort();
  sink = (sink + values[1000]) % 1;
  const hash = createHash('sha256');
  for (let i = 0; i < 200; i++) hash.update(`block ${i} ${sink}`);
  sink += hash.digest()[0] / 256;
  let text = '';
  for (let i = 0; i < 20_000; i++) text += i.toString(36);
  sink = (sink + text.length) % 1;
}
