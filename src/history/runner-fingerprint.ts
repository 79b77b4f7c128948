/**
 * The runner fingerprint: one line that tells machines apart, so a run on different hardware or a
 * new runner image can be told from a change in the code. Built by the adapters (CLI and action)
 * from the runner's environment and node:os, stored on each recorded run (RunInfo.runner); what
 * the gate makes of it is the model's business.
 */
import { availableParallelism, cpus } from 'node:os';

/** What node:os and process say about the machine (passed in, so the text is testable). */
export interface MachineFacts {
  /** process.platform: 'linux', 'darwin', 'win32', ... */
  platform: string;
  /** process.arch: 'x64', 'arm64', ... */
  arch: string;
  /** The first CPU's model string, when the system gives one. */
  cpuModel?: string;
  /** Cores the process may use (os.availableParallelism). */
  cpuCount: number;
  /** process.version: 'v24.11.0'. */
  nodeVersion: string;
}

const OS_NAMES: Record<string, string> = { linux: 'Linux', darwin: 'macOS', win32: 'Windows' };
const ARCH_NAMES: Record<string, string> = { x64: 'X64', arm64: 'ARM64', ia32: 'X86', arm: 'ARM' };
const LONGEST_PART = 120;

/**
 * "OS ARCH | IMAGE VERSION | CPU MODEL | N cpu | node VERSION": the runner's RUNNER_OS and
 * RUNNER_ARCH (GitHub's spelling, e.g. "Linux X64"; outside Actions the same names from node:os),
 * its ImageOS and ImageVersion when set (hosted runners set them), the CPU model, the core count
 * and the Node.js version. Parts that are unknown are left out; each is cleaned of control
 * characters and of "|" (the separator) and cut at 120 characters.
 *
 * @example runnerFingerprint({ RUNNER_OS: 'Linux', RUNNER_ARCH: 'X64', ImageOS: 'ubuntu24', ImageVersion: '20261110.1' },
 *   { platform: 'linux', arch: 'x64', cpuModel: 'AMD EPYC 7763 64-Core Processor', cpuCount: 4, nodeVersion: 'v24.11.0' })
 * // 'Linux X64 | ubuntu24 20261110.1 | AMD EPYC 7763 64-Core Processor | 4 cpu | node 24.11.0'
 */
export function runnerFingerprint(env: Record<string, string | undefined>, machine: MachineFacts): string {
  const os = clean(env.RUNNER_OS) || OS_NAMES[machine.platform] || clean(machine.platform);
  const arch = clean(env.RUNNER_ARCH) || ARCH_NAMES[machine.arch] || clean(machine.arch);
  const image = [clean(env.ImageOS), clean(env.ImageVersion)].filter((p) => p !== '').join(' ');
  const parts = [
    [os, arch].filter((p) => p !== '').join(' '),
    image,
    clean(machine.cpuModel),
    machine.cpuCount > 0 ? `${machine.cpuCount} cpu` : '',
    `node ${clean(machine.nodeVersion).replace(/^v/, '')}`,
  ];
  return parts.filter((p) => p !== '').join(' | ');
}

/**
 * The facts of the machine this process runs on.
 * @example runnerFingerprint(process.env, machineFacts())
 */
export function machineFacts(): MachineFacts {
  const model = cpus()[0]?.model;
  return {
    platform: process.platform,
    arch: process.arch,
    ...(model ? { cpuModel: model } : {}),
    cpuCount: availableParallelism(),
    nodeVersion: process.version,
  };
}

function clean(text: string | undefined): string {
  return (text ?? '')
    .replace(/[\u0000-\u001f\u007f-\u009f|]+/g, ' ')
    .replace(/\s+/g, ' ')
    .trim()
    .slice(0, LONGEST_PART)
    .trim();
}
