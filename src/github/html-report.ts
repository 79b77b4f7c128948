import { join } from 'node:path';
import type { Report } from '../gate/report.js';
import type { ArtifactUploader } from '../history/artifact-store.js';
import type { History } from '../history/history.js';
import type { RunContext } from './context.js';
import { describeError } from './describe-error.js';
import type { ActionSink } from './sink.js';

/** What the HTML step needs of the action's collaborators (ActionDeps has them all). */
export interface HtmlReportDeps {
  sink: ActionSink;
  now(): Date;
  writeText(path: string, text: string): Promise<void>;
  upload: ArtifactUploader;
}

/**
 * The HTML report is extra: written beside the JSON report and uploaded as its own artifact;
 * a failure only warns.
 * @example await uploadHtml(deps, context, 'ci', report, history, 90)
 */
export async function uploadHtml(
  deps: HtmlReportDeps,
  context: RunContext,
  series: string,
  report: Report,
  history: History,
  retentionDays: number,
): Promise<void> {
  // Imported here, on the html-report path only: d3, the page code and node:crypto (artifact names)
  // stay out of every other run.
  const { artifactName } = await import('../history/artifact-name.js');
  // One artifact per series and attempt: artifact names must be unique within a workflow run.
  const name = `${artifactName('bellgate-report', series)}-${context.attempt}`;
  try {
    const { renderHtmlReport } = await import('../report/html.js');
    const html = renderHtmlReport({ report, history, generatedAt: deps.now().toISOString() });
    await deps.writeText(join(context.runnerTemp, 'bellgate', `${name}.html`), html);
    await deps.upload(name, [{ name: 'report.html', text: html }], retentionDays);
    deps.sink.info(`bellgate: uploaded the HTML report as artifact ${name}`);
  } catch (error) {
    deps.sink.warning(`bellgate: could not upload the HTML report: ${describeError(error)}`);
  }
}
