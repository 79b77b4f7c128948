import { join } from 'node:path';
import { seriesSlug } from '../history/series-slug.js';

/**
 * Where the action writes its JSON report (the `report` output): one file per series under
 * RUNNER_TEMP, `bellgate/report-<slug>-<8 hex>.json`. The slug keeps the name readable; the hash
 * keeps series whose slugs coincide ("bench/linux", "bench linux") apart.
 *
 * The hash is FNV-1a (32 bit, over the UTF-8 bytes): the file only lives for the job, so a short
 * non-cryptographic hash is enough to tell the series apart.
 * @example reportPath('/tmp/runner', 'bench/linux') // '/tmp/runner/bellgate/report-bench-linux-<8 hex>.json'
 */
export function reportPath(runnerTemp: string, series: string): string {
  const slug = seriesSlug(series);
  const hash = fnv1a32(series).toString(16).padStart(8, '0');
  return join(runnerTemp, 'bellgate', slug === '' ? `report-${hash}.json` : `report-${slug}-${hash}.json`);
}

/**
 * FNV-1a, 32 bit: offset basis 2166136261, prime 16777619 (Fowler, Noll and Vo's published parameters).
 * @example fnv1a32('a') // 0xe40c292c
 */
export function fnv1a32(text: string): number {
  let hash = 0x811c9dc5;
  for (const byte of new TextEncoder().encode(text)) hash = Math.imul(hash ^ byte, 0x01000193) >>> 0;
  return hash;
}
