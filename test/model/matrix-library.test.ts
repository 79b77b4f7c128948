import { describe, expect, it, vi } from 'vitest';

// Each test takes fresh modules, so "not loaded yet" is real.
describe('loadMatrixLibrary / prepareGate', () => {
  it('ml-matrix is refused before it is loaded, and usable after', async () => {
    vi.resetModules();
    const lib = await import('../../src/model/matrix-library.js');
    expect(() => lib.matrixLibrary()).toThrow(/loadMatrixLibrary/);
    await lib.loadMatrixLibrary();
    // Reference: the 2 x 2 identity (ml-matrix's Matrix.eye), checked by its definition.
    expect(lib.matrixLibrary().Matrix.eye(2).to2DArray()).toEqual([
      [1, 0],
      [0, 1],
    ]);
  });

  it('prepareGate loads it (and the group judge) for a config with groups and not without', async () => {
    vi.resetModules();
    const lib = await import('../../src/model/matrix-library.js');
    const { prepareGate } = await import('../../src/gate/gate.js');
    const { parseConfig } = await import('../../src/config/load.js');
    const { runGate } = await import('../../src/gate/gate.js');
    const { emptyHistory } = await import('../../src/history/history.js');
    const grouped = parseConfig('groups:\n  - name: timings\n    match: "time/*"\n', 'grouped.yml');
    const run = { metrics: new Map([['time/a', { value: 1, count: 1 }]]), meta: new Map() };
    // Unprepared, a config with groups is refused plainly (a caller's mistake), not half-judged.
    expect(() => runGate({ config: grouped, history: emptyHistory('s'), run, series: 's' })).toThrow(/prepareGate/);
    await prepareGate(parseConfig('keep: 500\n', 'plain.yml'));
    expect(() => lib.matrixLibrary()).toThrow(/not loaded/);
    await prepareGate(grouped);
    expect(lib.matrixLibrary().Matrix.eye(1).get(0, 0)).toBe(1);
    expect(
      runGate({ config: grouped, history: emptyHistory('s'), run, series: 's' }).metrics.map((m) => m.status),
    ).toEqual(['new']);
  });
});
