import { rename, writeFile, rm } from 'node:fs/promises';
import { createTwoFilesPatch } from 'diff';
import { parseLabels, type RegressionLabel } from '../../gate/tune/labels.js';
import { tuneHistory } from '../../gate/tune/tune.js';
import { applyConfigEdit, type ConfigEdit } from '../../config/write-config.js';
import type { TuneSetting } from '../../gate/tune/setting.js';
import { InputError } from '../../errors/input-error.js';
import { renderTuneJson } from '../../report/tune-json.js';
import { renderTuneText } from '../../report/tune-text.js';
import type { CliIo, CommandContext } from '../context.js';
import { loadConfig, parseConfig } from '../../config/load.js';
import { openHistory } from '../open-history.js';
import { resolvePath } from '../paths.js';
import { readFlagFile, readFlagFileIfAny } from '../read-text.js';

export interface TuneOptions {
  history: string;
  config?: string;
  labels?: string;
  target?: number;
  write?: string;
  /** Write even a blind recommendation (one that catches almost nothing). */
  force?: boolean;
  last?: number;
  format: 'text' | 'json';
}

/**
 * The work of `bellgate tune`: replays the gate clean and with injected regressions, prints the
 * settings and the recommendation, and writes it into the config with `--write` — every key it
 * recommends; a blind recommendation only with `--force`.
 * @throws InputError for an empty history, bad labels (file:line:col), unreadable files, a
 * `--write` without evidence, or a blind recommendation to write without `--force` (after printing).
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
  // A config that cannot take the recommendation fails before the replay, not after it.
  const before = options.write === undefined ? undefined : await configText(ctx, options.write);
  const progress = progressBar(ctx.io);
  const result = tuneHistory({
    config,
    history,
    ...(labels === undefined ? {} : { labels }),
    ...(options.target === undefined ? {} : { target: options.target }),
    ...(options.last === undefined ? {} : { last: options.last }),
    onProgress: progress.update,
  });
  progress.done();
  const r = result.recommendation;
  let refused: InputError | undefined;
  let written: { file: string; diff: string } | undefined;
  if (options.write !== undefined) {
    if (r === undefined)
      refused = new InputError('no run could be replayed, so there is no recommendation to write', {
        where: options.history,
        fix: 'record at least min-runs + 1 runs first',
      });
    else if (r.blind && options.force !== true)
      refused = new InputError(
        `the recommended setting is blind (it catches ${Math.round(100 * (r.score.caught.at(-1)?.evidence.rate ?? 0))}% of the largest injected regressions), so it was not written`,
        {
          where: options.write,
          fix: 'see what it misses above; add --force to write it anyway, or raise --target',
        },
      );
    else written = await writeSuggestion(ctx, options.write, before!, editOf(r.setting));
  }
  if (options.format === 'json') {
    ctx.io.stdout(
      renderTuneJson(result, {
        ...(written === undefined ? {} : { written }),
        ...(refused === undefined ? {} : { refused: refused.message }),
      }),
    );
  } else {
    ctx.io.stdout(renderTuneText(result));
    if (written !== undefined) {
      ctx.io.stdout(
        written.diff === ''
          ? `\n${options.write}: already as recommended, not changed\n`
          : `\nwrote ${options.write}:\n${written.diff}`,
      );
    }
  }
  if (refused !== undefined) throw refused;
}

/** Every key of the recommended setting, as the config writer takes them. */
function editOf(s: TuneSetting): ConfigEdit {
  return {
    defaults: {
      transform: s.transform,
      sharedMove: s.sharedMove,
      changePoints: s.changePoints,
      ...(s.family === 'none' ? { cutoff: s.cutoff! } : {}),
    },
    family: s.family,
    ...(s.family === 'none' ? {} : { budget: s.budget! }),
  };
}

/** The text of the config to write into ('' when it does not exist yet), checked to be a valid config. */
async function configText(ctx: CommandContext, path: string): Promise<string> {
  const text = (await readFlagFileIfAny(ctx, '--write', path, true)) ?? '';
  parseConfig(text, path);
  return text;
}

/** Applies the suggestion to the file (missing: a new config), atomically; returns the unified diff ('' when unchanged). */
async function writeSuggestion(
  ctx: CommandContext,
  path: string,
  before: string,
  edit: ConfigEdit,
): Promise<{ file: string; diff: string }> {
  const full = resolvePath(ctx, path);
  const after = applyConfigEdit(before, path, edit);
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
      io.stderr(`\rreplaying [${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${done}/${total} gate calls`);
    },
    done() {
      if (drawn) io.stderr('\r\u001b[K');
    },
  };
}
