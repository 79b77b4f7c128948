import { expect } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';

/** Runs `fn`, expects an InputError, and returns it so a test can check its message and place. */
export function inputErrorOf(fn: () => unknown): InputError {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  return expect.fail('expected an InputError, but nothing was thrown');
}
