import { describe, expect, it, vi } from 'vitest';

// Each test takes fresh modules, so "not loaded yet" is real.
describe('loadMatrixLibrary / prepareGate', () => {
  it('ml-matrix is refused before it is loaded, and usable after', async () => {
    vi.resetModules();
    const lib = await import('../../src/model/matrix-library.js');
    expect(() => lib.matrixLibrary()).toThrow(/loadMatrixLibrary/);
    await lib.loadMatrixLibrary();
    // Reference: the 2 x 2 identity (ml-matrix's Matrix.eye), checked by its definition.
    expect(lib.matrixLibrary().Matrix.eye(2).to2DArray()).toEqual([[1, 0], [0, 1]]);
  });

  it('prepareGate loads it for a config with groups and not without', async () => {
    vi.resetModules();
    const lib = await import('../../src/model/matrix-library.js');
    const { prepareGate } = await import('../../src/gate/gate.js');
    const { parseConfig } = await import('../../src/config/load.js');
    await prepareGate(parseConfig('keep: 500\n', 'plain.yml'));
    expect(() => lib.matrixLibrary()).toThrow(/not loaded/);
    await prepareGate(parseConfig('groups:\n  - name: timings\n    match: "time/*"\n', 'grouped.yml'));
    expect(lib.matrixLibrary().Matrix.eye(1).get(0, 0)).toBe(1);
  });
});
