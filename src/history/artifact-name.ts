import { createHash } from 'node:crypto';

/**
 * The artifact name of a series: readable slug plus a short hash, so distinct series never share a
 * name even when their slugs coincide. Only characters the artifact service accepts. A module of
 * its own so the action can name artifacts without loading the artifact store and its zip reader.
 * @example artifactName('bellgate-history', 'bench/linux') // 'bellgate-history-bench-linux-<8 hex>'
 */
export function artifactName(history: string, series: string): string {
  const slug = series
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  const hash = createHash('sha256').update(series).digest('hex').slice(0, 8);
  return slug === '' ? `${history}-${hash}` : `${history}-${slug}-${hash}`;
}
