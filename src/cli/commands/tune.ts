import { rename, writeFile, rm } from 'node:fs/promises';
import { Command, InvalidArgumentError, Option } from 'commander';
import { createTwoFilesPatch } from 'diff';
import { parseLabels, type RegressionLabel } from '../../gate/tune/labels.js';
import { tuneHistory } from '../../gate/tune/tune.js';
import { applyConfigEdit } from '../../gate/tune/write-config.js';
import { parseHistory } from '../../history/document.js';
import { InputError } from '../../model/input-error.js';
import { renderTuneJson } from '../../report/tune-json.js';
import { renderTuneText } from '../../report/tune-text.js';
import type { CliIo, CommandContext } from '../context.js';
import { loadConfig } from '../load-config.js';
import { configOption, examples, historyOption } from '../options.js';
import { resolvePath } from '../paths.js';
import { readUserText } from '../read-text.js';

interface TuneOptions {
  history: string;
  config?: string;
  labels?: string;
  target?: number;
  write?: string;
  format: 'text' | 'json';
}

/**
 * `bellgate tune`: replays the gate over the history and prints the cutoff ladder, per-metric
 * false alarms, normality and a suggestion; `--labels` scores known regressions (precision,
 * recall, F1), `--target N` picks the loosest cutoff with at most N falsely flagged runs per 100,
 * `--write FILE` puts the suggestion into a config (comments and order kept) and prints the diff.
 * Exit 0, or 2 for bad input (a labels problem names file:line:col).
 */
export function tuneCommand(ctx: CommandContext): Command {
  const cmd = new Command('tune').description('suggest cutoffs from evidence: replay the gate over the history and score a ladder of cutoffs');
  historyOption(cmd, true, 'history file of trusted runs to replay (JSON)');
  configOption(cmd);
  cmd
    .option('--labels <file>', 'YAML or JSON list of known regressions: `regressions: [{run: "1234-1"}, {run: "1240-1", metric: "latency/p95"}]`')
    .option('--target <n>', 'false alarms per 100 runs to stay at or under (default 1)', parseTarget)
    .option('--write <file>', 'write the suggested cutoffs and transforms into this config file and print the diff')
    .addOption(new Option('--format <format>', 'output format').choices(['text', 'json']).default('text'));
  examples(cmd, [
    'bellgate tune --history .bellgate/history.json --config .github/bellgate.yml',
    'bellgate tune --history h.json --labels known-regressions.yml --format json',
    'bellgate tune --history h.json --target 0.5 --write .github/bellgate.yml',
  ]);
  return cmd.action(async (options: TuneOptions) => {
    const config = await loadConfig(ctx, options.config);
    const historyText = await readUserText(resolvePath(ctx, options.history), '--history');
    const history = parseHistory(historyText, options.history);
    if (history.runs.length === 0) {
      throw new InputError('the history holds no runs, so there is nothing to replay', { where: options.history, fix: 'record runs first (bellgate record / import)' });
    }
    let labels: RegressionLabel[] | undefined;
    if (options.labels !== undefined) labels = parseLabels(await readUserText(resolvePath(ctx, options.labels), '--labels'), options.labels);
    const progress = progressBar(ctx.io);
    const result = tuneHistory({
      config,
      history,
      ...(labels === undefined ? {} : { labels }),
      ...(options.target === undefined ? {} : { target: options.target }),
      onProgress: progress.update,
    });
    progress.done();
    const written = options.write === undefined ? undefined : await writeSuggestion(ctx, options.write, result.suggestion);
    if (options.format === 'json') {
      ctx.io.stdout(renderTuneJson(result, written === undefined ? {} : { written }));
      return;
    }
    ctx.io.stdout(renderTuneText(result));
    if (written !== undefined) {
      ctx.io.stdout(written.diff === '' ? `\n${options.write}: already as suggested, not changed\n` : `\nwrote ${options.write}:\n${written.diff}`);
    }
  });
}

function parseTarget(text: string): number {
  const n = Number(text);
  if (text.trim() === '' || !Number.isFinite(n) || n < 0 || n > 100) {
    throw new InvalidArgumentError('expected a number of false alarms per 100 runs from 0 to 100, e.g. 1');
  }
  return n;
}

/** Applies the suggestion to the file (missing: a new config), atomically; returns the unified diff ('' when unchanged). */
async function writeSuggestion(ctx: CommandContext, path: string, suggestion: Parameters<typeof applyConfigEdit>[2]): Promise<{ file: string; diff: string }> {
  const full = resolvePath(ctx, path);
  let before = '';
  try {
    before = await readUserText(full, '--write');
  } catch (error) {
    if (!(error instanceof InputError && /no such file/.test(error.message))) throw error;
  }
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
