// The fingerprint text from the runner's environment and node:os facts. RUNNER_OS, RUNNER_ARCH
// and their spellings ("Linux", "X64", "ARM64") are GitHub's documented default variables
// ("Variables reference"); ImageOS and ImageVersion are set by GitHub-hosted runner images
// (from memory); process.platform and process.arch values are Node's documented ones.
import { describe, expect, it } from 'vitest';
import { machineFacts, runnerFingerprint, type MachineFacts } from '../../src/history/runner-fingerprint.js';

const epyc: MachineFacts = {
  platform: 'linux',
  arch: 'x64',
  cpuModel: 'AMD EPYC 7763 64-Core Processor',
  cpuCount: 4,
  nodeVersion: 'v24.11.0',
};

describe('runnerFingerprint', () => {
  it('a hosted runner: OS and arch as GitHub spells them, the image, the CPU, the cores and Node.js', () => {
    const env = { RUNNER_OS: 'Linux', RUNNER_ARCH: 'X64', ImageOS: 'ubuntu24', ImageVersion: '20261110.1' };
    expect(runnerFingerprint(env, epyc)).toBe(
      'Linux X64 | ubuntu24 20261110.1 | AMD EPYC 7763 64-Core Processor | 4 cpu | node 24.11.0',
    );
  });

  it('outside Actions the same names come from node:os; unknown parts are left out', () => {
    expect(runnerFingerprint({}, { platform: 'darwin', arch: 'arm64', cpuCount: 8, nodeVersion: 'v22.3.0' })).toBe(
      'macOS ARM64 | 8 cpu | node 22.3.0',
    );
    expect(runnerFingerprint({}, { platform: 'freebsd', arch: 'riscv64', cpuCount: 0, nodeVersion: 'v20.1.0' })).toBe(
      'freebsd riscv64 | node 20.1.0',
    );
  });

  it('cleans what the environment says: control characters and the "|" separator become spaces, long parts are cut', () => {
    const env = { RUNNER_OS: 'Linux\n::error::x', ImageOS: 'a|b', ImageVersion: 'v'.repeat(500) };
    const text = runnerFingerprint(env, { ...epyc, cpuModel: '  Intel(R)   Xeon(R)\tCPU  ' });
    expect(text).toBe(`Linux ::error::x X64 | a b ${'v'.repeat(120)} | Intel(R) Xeon(R) CPU | 4 cpu | node 24.11.0`);
    expect(text.split(' | ')).toHaveLength(5);
    expect(text).not.toMatch(/[\n\t]/);
  });

  it('machineFacts describes this process', () => {
    const facts = machineFacts();
    expect(facts.platform).toBe(process.platform);
    expect(facts.nodeVersion).toBe(process.version);
    expect(facts.cpuCount).toBeGreaterThan(0);
  });
});
