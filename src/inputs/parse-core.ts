import type { InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { detectFormat } from './detect.js';
import { metricFormat, type MetricFormat } from './formats.js';
import type { ReadResult } from './run.js';

/** One format's reader. */
export type Reader = (text: string, file: string, limits: InputLimits) => ReadResult;

/** Drops a byte-order mark and settles the format (given, or detected from the content). */
export function chooseFormat(text: string, file: string, format?: string): { body: string; chosen: MetricFormat } {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const chosen = format === undefined || format === '' ? detectFormat(body, file) : metricFormat(format);
  return { body, chosen };
}

/**
 * Runs a reader so that only InputError comes out, and refuses a file that yields no metric at all
 * (almost always a step that failed to write it).
 */
export function runReader(
  reader: Reader,
  chosen: MetricFormat,
  body: string,
  file: string,
  limits: InputLimits,
): ReadResult {
  let result: ReadResult;
  try {
    result = reader(body, file, limits);
  } catch (error) {
    if (error instanceof InputError) throw error;
    // A library failing in a way it does not document must still reach the user as bad input.
    throw new InputError(
      `cannot read the file as ${chosen}: ${error instanceof Error ? error.message : String(error)}`,
      {
        where: file,
        fix: 'check the file, or choose another format with --input-format',
        cause: error,
      },
    );
  }
  if (result.readings.length === 0 && result.notFitted.size === 0) {
    throw new InputError(`no metrics found in the file (read as ${chosen})`, {
      where: file,
      fix: 'check the step that writes this file, or choose another format with --input-format',
    });
  }
  return result;
}
