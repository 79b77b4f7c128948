import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cutoffRows } from './helpers/cutoff-rows.js';
import { COMMANDS, buildProgram } from '../../src/cli/main.js';
import { createContext } from '../../src/cli/context.js';

// README.md states numbers and flags; these checks keep it in step with the code.
const root = resolve(import.meta.dirname, '..', '..');
const readme = readFileSync(resolve(root, 'README.md'), 'utf8');

describe('README.md', () => {
  it('the cutoff table is what the model computes', () => {
    const rows = cutoffRows();
    const missing = rows.filter((r) => !readme.includes(r));
    expect(missing, `README rows should read:\n${rows.join('\n')}`).toEqual([]);
  });

  it('the cutoff table agrees with the standard normal table', () => {
    // c = 0.01 -> sqrt(-2 ln 0.01) = 3.0349 sigma. Abramowitz and Stegun table 26.1 (from memory):
    // P(Z > 3.03) = 0.00122, P(Z > 3.04) = 0.00118, so about 0.00120 at 3.035 and 0.0024 two-sided
    // The README row must say the same to its three digits.
    const row = readme.split('\n').find((l) => l.startsWith('| 0.01 |'));
    const cells = (row ?? '').split('|').map((c) => Number(c.trim()));
    expect(cells[2]).toBeCloseTo(3.035, 3);
    expect(Math.abs((cells[3] ?? 0) - 0.0012) / 0.0012).toBeLessThan(0.02);
    expect(Math.abs((cells[4] ?? 0) - 0.0024) / 0.0024).toBeLessThan(0.02);
  });

  it('documents every command and every flag', () => {
    const program = buildProgram(
      createContext({ stdout: () => {}, stderr: () => {}, cwd: root, env: {}, isTTY: false }),
    );
    expect(program.commands).toHaveLength(COMMANDS.length);
    for (const cmd of program.commands) {
      expect(readme, cmd.name()).toContain(`bellgate ${cmd.name()}`);
      for (const option of cmd.options) expect(readme, `${cmd.name()} ${option.long}`).toContain(option.long ?? '');
    }
  });

  it('opens with the two set-up commands', () => {
    expect(readme).toContain('```sh\nnpm ci && npm run demo\n```');
    expect(readme).toContain('```sh\nnpm test\n```');
  });

  it('puts the user first: the job, a copyable workflow, the two commands, configuration, then the statistics', () => {
    const at = (text: string): number => readme.indexOf(text);
    const order = [
      at('## Add it to a workflow'),
      at('## Try it locally'),
      at('## Configuration'),
      at('## Using it in GitHub Actions'),
      at('## How the decision works'),
    ];
    expect(order.every((x) => x > 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
    // The workflow to copy is the example the e2e tests run as written, byte for byte.
    const example = readFileSync(resolve(root, 'examples', 'workflows', 'bench.yml'), 'utf8');
    expect(readme).toContain('```yaml\n' + example + '```');
  });

  it('keeps the GitHub Actions section for the action', () => {
    expect(readme).toContain('## Using it in GitHub Actions');
  });
});
