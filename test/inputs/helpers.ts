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

/** Awaits `promise`, expects it to reject with an InputError, and returns the error. */
export async function rejectionOf(promise: Promise<unknown>): Promise<InputError> {
  try {
    await promise;
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  return expect.fail('expected an InputError, but the promise resolved');
}
