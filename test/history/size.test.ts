import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { parseHistory, serializeHistory } from '../../src/history/document.js';
import { bigHistory, serializeV1 } from './big-history.js';

describe('document size at scale', () => {
  // 300 x 300 keeps the suite quick on a shared runner; the 1,000 x 1,000 figures are measured with
  // the same generator (big-history.ts) and reported in DEVELOPERS.md.
  it('300 runs x 300 metrics: version 2 compresses smaller than version 1 and both read to the same History', () => {
    const h = bigHistory(300, 300);
    const v2 = serializeHistory(h);
    const v1 = serializeV1(h);
    const gz2 = gzipSync(v2).length;
    const gz1 = gzipSync(v1).length;
    console.info(`history 300x300: v2 ${v2.length} B (gzip ${gz2} B), v1 ${v1.length} B (gzip ${gz1} B)`);
    expect(gz2).toBeLessThan(gz1);
    expect(v2.length).toBeLessThan(v1.length);
    // the migrated version-1 document writes out as exactly the version-2 document (string compare:
    // a deep comparison of a million values would dominate the test's time)
    expect(serializeHistory(parseHistory(v1, 'v1')) === v2).toBe(true);
    expect(parseHistory(v2, 'v2').columns.size).toBe(300);
  });
});
