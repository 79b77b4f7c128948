// The runner sink against the reference: @actions/core 3 (the runner's own toolkit) must write the
// same bytes for the same calls — workflow commands on stdout, GITHUB_OUTPUT entries (compared
// with their random delimiters taken out) and the job summary.
import * as core from '@actions/core';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import type { AnnotationProps } from '../../src/github/sink.js';
import { createRunnerSink, keyValueEntry, workflowCommand } from '../../src/github/runner-sink.js';

const dir = mkdtempSync(join(tmpdir(), 'bellgate-runner-sink-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const saved = { ...process.env };
afterEach(() => {
  process.env = { ...saved };
  process.exitCode = undefined;
  vi.restoreAllMocks();
});

/** What `act` writes to process.stdout (and nothing reaches the test output). */
function stdoutOf(act: () => void): string {
  let out = '';
  vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
    out += String(chunk);
    return true;
  });
  act();
  vi.restoreAllMocks();
  return out;
}

function ours(env: Record<string, string | undefined> = process.env) {
  let out = '';
  let failed = false;
  const sink = createRunnerSink({ env, write: (t) => (out += t), fail: () => (failed = true) });
  return { sink, out: () => out, failed: () => failed };
}

// Texts chosen to hit every escape: %, CR, LF, ':' and ',' (properties only), '::' inside, unicode.
const MESSAGES = ['plain', '100% slower', 'two\nlines\r\nand CR', 'a::b, c: d', 'kestrel “post” ✓', '', '%0A literal'];
const PROPS: (AnnotationProps | undefined)[] = [
  undefined,
  {},
  { title: 'bellgate: latency/p95' },
  { title: 'x,y', file: 'out/bench:1.json', startLine: 12 },
  { file: 'bench.json', startLine: 0 },
  { title: '' },
];

describe('createRunnerSink writes what @actions/core writes', () => {
  it.each(['warning', 'error', 'notice'] as const)('%s annotations, every escape and property mix', (kind) => {
    for (const message of MESSAGES) {
      for (const props of PROPS) {
        const reference = stdoutOf(() => core[kind](message, props));
        const mine = ours();
        mine.sink[kind](message, props);
        expect(mine.out(), `${kind} ${JSON.stringify(message)} ${JSON.stringify(props)}`).toBe(reference);
      }
    }
  });

  it('info lines and masks (add-mask)', () => {
    for (const message of MESSAGES) {
      const mine = ours();
      mine.sink.info(message);
      mine.sink.setSecret(message);
      expect(mine.out()).toBe(stdoutOf(() => (core.info(message), core.setSecret(message))));
    }
  });

  it('setFailed marks the step failed and writes an error command', () => {
    const reference = stdoutOf(() => core.setFailed('bellgate: 2 metrics regressed\nsee the summary'));
    expect(process.exitCode).toBe(1); // @actions/core's ExitCode.Failure
    const mine = ours();
    mine.sink.setFailed('bellgate: 2 metrics regressed\nsee the summary');
    expect(mine.failed()).toBe(true);
    expect(mine.out()).toBe(reference);
  });

  it('outputs in GITHUB_OUTPUT: the same entries once the random delimiters are named alike', () => {
    const theirs = join(dir, 'output-core');
    const mineFile = join(dir, 'output-ours');
    writeFileSync(theirs, '');
    writeFileSync(mineFile, '');
    const values: [string, string][] = [
      ['verdict', 'regressed'],
      ['report', '/tmp/a b/report.json'],
      ['multi', 'line one\nline two\n'],
      ['empty', ''],
    ];
    process.env.GITHUB_OUTPUT = theirs;
    for (const [n, v] of values) core.setOutput(n, v);
    const mine = ours({ GITHUB_OUTPUT: mineFile });
    for (const [n, v] of values) mine.sink.setOutput(n, v);
    const plain = (file: string): string =>
      readFileSync(file, 'utf8').replace(/ghadelimiter_[0-9a-f-]{36}/g, 'DELIMITER');
    expect(plain(mineFile)).toBe(plain(theirs));
    expect(plain(mineFile)).toContain('multi<<DELIMITER\nline one\nline two\n\nDELIMITER\n');
  });

  it('each entry gets its own delimiter, of the shape @actions/core writes, and a value holding it is refused', () => {
    const delimiters = Array.from(
      { length: 200 },
      () => /<<(ghadelimiter_[0-9a-f-]{36})\n/.exec(keyValueEntry('a', 'b'))?.[1],
    );
    expect(
      delimiters.every(
        (d) => d !== undefined && /^ghadelimiter_[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/.test(d),
      ),
    ).toBe(true);
    expect(new Set(delimiters).size).toBe(200);
    const spy = vi.spyOn(Math, 'random').mockReturnValue(0.5);
    const fixed = /<<(ghadelimiter_[0-9a-f-]{36})\n/.exec(keyValueEntry('a', 'b'))![1]!;
    expect(() => keyValueEntry('a', `x${fixed}y`)).toThrow(/contains its delimiter/);
    spy.mockRestore();
  });

  it('without GITHUB_OUTPUT: the set-output command, as @actions/core falls back to', () => {
    delete process.env.GITHUB_OUTPUT;
    const reference = stdoutOf(() => core.setOutput('verdict', 'pass, 3: ok'));
    const mine = ours({});
    mine.sink.setOutput('verdict', 'pass, 3: ok');
    expect(mine.out()).toBe(reference);
  });

  it('a GITHUB_OUTPUT file that does not exist is refused, as @actions/core refuses it', () => {
    const missing = join(dir, 'no-such-output');
    process.env.GITHUB_OUTPUT = missing;
    expect(() => core.setOutput('a', 'b')).toThrow(/Missing file/);
    expect(() => ours({ GITHUB_OUTPUT: missing }).sink.setOutput('a', 'b')).toThrow(/Missing file/);
  });

  it('the job summary is appended like core.summary.addRaw(md, true).write()', async () => {
    const theirs = join(dir, 'summary-core');
    const mineFile = join(dir, 'summary-ours');
    writeFileSync(theirs, 'before\n');
    writeFileSync(mineFile, 'before\n');
    process.env.GITHUB_STEP_SUMMARY = theirs;
    for (const md of ['## Bellgate\n| a | b |', 'second']) await core.summary.addRaw(md, true).write();
    const mine = ours({ GITHUB_STEP_SUMMARY: mineFile });
    for (const md of ['## Bellgate\n| a | b |', 'second']) await mine.sink.appendSummary(md);
    expect(readFileSync(mineFile, 'utf8')).toBe(readFileSync(theirs, 'utf8'));
  });

  it('a missing summary file or variable is an error (the action turns it into a warning)', async () => {
    await expect(ours({ GITHUB_STEP_SUMMARY: join(dir, 'none') }).sink.appendSummary('x')).rejects.toThrow(
      /Unable to access summary file/,
    );
    await expect(ours({}).sink.appendSummary('x')).rejects.toThrow(/GITHUB_STEP_SUMMARY/);
  });

  it('workflowCommand: the documented escapes (workflow-commands page: %25, %0D, %0A; %3A, %2C in properties)', () => {
    expect(workflowCommand('warning', { title: 'a:b,c' }, '50%\r\n')).toBe('::warning title=a%3Ab%2Cc::50%25%0D%0A');
  });
});
