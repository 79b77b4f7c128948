import { rename, writeFile, rm } from 'node:fs/promises';
import { createTwoFilesPatch } from 'diff';
import { parseLabels, type RegressionLabel } from '../../gate/tune/labels.js';
import { tuneHistory } from '../../gate/tune/tune.js';
import { applyConfigEdit } from '../../config/write-config.js';
import { InputError } from '../../errors/input-error.js';
import { renderTuneJson } from '../../report/tune-json.js';
import { renderTuneText } from '../../report/tune-text.js';
import type { CliIo, CommandContext } from '../context.js';
import { loadConfig } from '../../config/load.js';
import { openHistory } from '../open-history.js';
import { resolvePath } from '../paths.js';
import { readFlagFile, readFlagFileIfAny } from '../read-text.js';

export interface TuneOptions {
  history: string;
  config?: string;
  labels?: string;
  target?: number;
  write?: string;
  format: 'text' | 'json';
}

/**
 * The work of `bellgate tune`: replays the gate, prints the ladder and suggestion,
 * and writes the config when `--write` is given.
 * @throws InputError for an empty history, bad labels (file:line:col) or unreadable files.
 * @example await runTune(ctx, { history: 'h.json', format: 'text' })
 */
export async function runTune(ctx: CommandContext, options: TuneOptions): Promise<void> {
  const config = await loadConfig(options.config, ctx.io.cwd);
  // Whatever series the file holds: tune replays the document it is given.
  const { history } = await openHistory(ctx, options.history, undefined);
  if (history.runs.length === 0) {
    throw new InputError('the history holds no runs, so there is nothing to replay', {
      where: options.history,
      fix: 'record runs first (bellgate record / import)',
    });
  }
  let labels: RegressionLabel[] | undefined;
  if (options.labels !== undefined)
    labels = parseLabels(await readFlagFile(ctx, '--labels', options.labels, true), options.labels);
  const progress = progressBar(ctx.io);
  const result = tuneHistory({
    config,
    history,
    ...(labels === undefined ? {} : { labels }),
    ...(options.target === undefined ? {} : { target: options.target }),
    onProgress: progress.update,
  });
  progress.done();
  const written =
    options.write === undefined ? undefined : await writeSuggestion(ctx, options.write, result.suggestion);
  if (options.format === 'json') {
    ctx.io.stdout(renderTuneJson(result, written === undefined ? {} : { written }));
    return;
  }
  ctx.io.stdout(renderTuneText(result));
  if (written !== undefined) {
    ctx.io.stdout(
      written.diff === ''
        ? `\n${options.write}: already as suggested, not changed\n`
        : `\nwrote ${options.write}:\n${written.diff}`,
    );
  }
}

/** Applies the suggestion to the file (missing: a new config), atomically; returns the unified diff ('' when unchanged). */
async function writeSuggestion(
  ctx: CommandContext,
  path: string,
  suggestion: Parameters<typeof applyConfigEdit>[2],
): Promise<{ file: string; diff: string }> {
  const full = resolvePath(ctx, path);
  const before = (await readFlagFileIfAny(ctx, '--write', path, true)) ?? '';
  const after = applyConfigEdit(before, path, suggestion);
  if (after === before) return { file: path, diff: '' };
  const temp = `${full}.bellgate-tune-${process.pid}.tmp`;
  try {
    await writeFile(temp, after, 'utf8');
    await rename(temp, full);
  } catch (error) {
    await rm(temp, { force: true });
    throw error;
  }
  return { file: path, diff: createTwoFilesPatch(path, path, before, after, 'before', 'suggested by bellgate tune') };
}

/** A one-line progress bar on stderr, drawn only when stderr is a terminal (CliIo's optional stderrIsTTY). */
function progressBar(io: CliIo): { update: (done: number, total: number) => void; done: () => void } {
  const tty = (io as CliIo & { stderrIsTTY?: boolean }).stderrIsTTY === true;
  let drawn = false;
  let last = -1;
  return {
    update(done, total) {
      if (!tty || total < 2) return;
      const width = 30;
      const filled = Math.round((width * done) / total);
      if (filled === last && done !== total) return;
      last = filled;
      drawn = true;
      io.stderr(`\rreplaying [${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${done}/${total} metrics`);
    },
    done() {
      if (drawn) io.stderr('\r\u001b[K');
    },
  };
}
