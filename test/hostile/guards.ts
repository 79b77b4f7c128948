import { expect } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';

/**
 * Shared checks of the hostile-input suites: the prototype of every object stays as it was, a
 * refusal is an InputError (or exit 2) with a message and no stack trace, and each suite counts
 * the cases it tried per parser and prints one summary line.
 */

const WATCHED: ReadonlyArray<readonly [string, object]> = [
  ['Object.prototype', Object.prototype],
  ['Array.prototype', Array.prototype],
  ['Function.prototype', Function.prototype],
  ['String.prototype', String.prototype],
  ['Map.prototype', Map.prototype],
];

/** Own property names and descriptors of the watched prototypes, to compare after a case. */
export function prototypeSnapshot(): string {
  return WATCHED.map(([label, proto]) => {
    const keys = Reflect.ownKeys(proto).map(String).sort();
    return `${label}: ${keys.join(',')}`;
  }).join('\n');
}

const BEFORE = prototypeSnapshot();

/** No prototype pollution: `({}).polluted` stays undefined and no prototype gained or lost a key. */
export function assertNoPollution(): void {
  const probe: Record<string, unknown> = {};
  expect(probe.polluted).toBeUndefined();
  expect((probe as { isAdmin?: unknown }).isAdmin).toBeUndefined();
  expect(({} as { constructor: unknown }).constructor).toBe(Object);
  expect(prototypeSnapshot()).toBe(BEFORE);
}

/** A stack-trace line as Node prints it ("    at fn (file:1:2)"). */
export const STACK_LINE = /\n {4}at /;

/**
 * Runs `parse`; a result is checked by `onResult`, a throw must be an InputError with a non-empty
 * message, a `where` (when `needWhere`) and a describe() without a stack. Returns what happened.
 */
export function resultOrInputError<T>(
  parse: () => T,
  onResult: (value: T) => void = () => {},
  needWhere = true,
): 'ok' | 'refused' {
  let value: T;
  try {
    value = parse();
  } catch (error) {
    return refused(error, needWhere);
  }
  onResult(value);
  assertNoPollution();
  return 'ok';
}

/** resultOrInputError for a parse that returns a promise (the metric-file parser loads some readers lazily). */
export async function settledOrInputError<T>(
  parse: () => Promise<T>,
  onResult: (value: T) => void = () => {},
  needWhere = true,
): Promise<'ok' | 'refused'> {
  let value: T;
  try {
    value = await parse();
  } catch (error) {
    return refused(error, needWhere);
  }
  onResult(value);
  assertNoPollution();
  return 'ok';
}

function refused(error: unknown, needWhere: boolean): 'refused' {
  if (!(error instanceof InputError)) {
    throw new Error(
      `expected an InputError, got ${error instanceof Error ? `${error.name}: ${error.message}` : String(error)}`,
    );
  }
  expect(error.message.length).toBeGreaterThan(0);
  expect(error.message).not.toMatch(/\[object Object\]|^undefined/);
  if (needWhere) expect(error.where ?? '').not.toBe('');
  expect(error.describe()).not.toMatch(STACK_LINE);
  assertNoPollution();
  return 'refused';
}

/** Counts cases per parser and how each ended; `line()` is the summary printed after a suite. */
export class CaseCounter {
  private readonly counts = new Map<string, { ok: number; refused: number }>();

  constructor(private readonly suite: string) {}

  add(parser: string, outcome: 'ok' | 'refused'): void {
    const c = this.counts.get(parser) ?? { ok: 0, refused: 0 };
    c[outcome]++;
    this.counts.set(parser, c);
  }

  total(parser?: string): number {
    if (parser !== undefined) {
      const c = this.counts.get(parser);
      return c ? c.ok + c.refused : 0;
    }
    let n = 0;
    for (const c of this.counts.values()) n += c.ok + c.refused;
    return n;
  }

  line(): string {
    const parts = [...this.counts].map(([p, c]) => `${p} ${c.ok + c.refused} (${c.ok} read, ${c.refused} refused)`);
    return `hostile cases [${this.suite}]: ${this.total()} tried — ${parts.join('; ')}`;
  }

  /** Prints the summary line (vitest shows it under the suite's output). */
  print(): void {
    console.log(this.line());
  }
}

/** Deterministic fast-check settings for every property here: fixed seed, bounded runs. */
export const FC = (numRuns: number) => ({ seed: 0x8e11, numRuns, endOnFailure: true });
