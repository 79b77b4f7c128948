import { settingsFor } from '../../config/rules.js';
import { InputError } from '../../errors/input-error.js';
import { referenceFromText } from '../../gate/since/reference.js';
import { reviewSince } from '../../gate/since/review-since.js';
import type { SinceReport } from '../../gate/since/since-report.js';
import type { History } from '../../history/history.js';
import { renderSinceJson } from '../../report/since-json.js';
import { renderSinceMarkdown } from '../../report/since-markdown.js';
import { renderSinceText } from '../../report/since-text.js';
import type { CommandContext } from '../context.js';
import { loadConfig } from '../../config/load.js';
import type { ReportFormat } from '../options.js';
import { historyStore } from '../open-history.js';

export interface SinceCliOptions {
  history: string;
  config?: string;
  series: string;
  format: ReportFormat;
  at?: string;
  all?: boolean;
}

/**
 * Reads the history and reviews it since `ref` (with `at`, the reference commit's time): the
 * review that `bellgate since` prints and `bellgate report --since` draws, with the history it read.
 * @throws InputError for a REF the history cannot resolve, an empty history or a bad config; StoreError for an unreadable history.
 */
export async function reviewSinceRef(
  ctx: CommandContext,
  ref: string,
  options: { history: string; series: string; config?: string; at?: string },
): Promise<{ report: SinceReport; history: History }> {
  const config = await loadConfig(options.config, ctx.io.cwd);
  const history = await historyStore(ctx, options.history, options.series).read();
  if (history.runs.length === 0) {
    throw new InputError('the history has no runs to review', {
      where: options.history,
      fix: 'point --history at a history that bellgate record or the action has written',
    });
  }
  const reference = referenceFromText(ref, history.runs);
  if (options.at !== undefined) reference.time = options.at;
  return { report: reviewSince(history, reference, { worse: (name) => settingsFor(config, name).worse }), history };
}

/**
 * The work of `bellgate since REF`: resolves REF in the
 * history, reviews every metric and prints the review in the chosen format.
 * @throws InputError for a REF the history cannot resolve or a bad config; StoreError for an unreadable history.
 * @example await runSince(ctx, 'v2.3.0-sha', { history: 'h.json', series: 'default', format: 'text' })
 */
export async function runSince(ctx: CommandContext, ref: string, options: SinceCliOptions): Promise<void> {
  const { report } = await reviewSinceRef(ctx, ref, options);
  const text =
    options.format === 'json'
      ? renderSinceJson(report)
      : options.format === 'markdown'
        ? renderSinceMarkdown(report)
        : renderSinceText(report, { all: options.all === true });
  ctx.io.stdout(text);
}
