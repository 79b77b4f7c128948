/**
 * The ActionSink spoken to the runner through @actions/core, the runner's own toolkit: workflow
 * commands on stdout, outputs in GITHUB_OUTPUT, the job summary in GITHUB_STEP_SUMMARY, masking
 * and the step's failure. Nothing here re-implements that protocol.
 */
import * as core from '@actions/core';
import type { ActionSink } from './sink.js';

/**
 * @example createCoreSink().warning('p95 regressed', { title: 'bellgate', file: 'bench.json' })
 */
export function createCoreSink(): ActionSink {
  return {
    info: (message) => core.info(message),
    warning: (message, props) => core.warning(message, props),
    error: (message, props) => core.error(message, props),
    notice: (message, props) => core.notice(message, props),
    setOutput: (name, value) => core.setOutput(name, value),
    setSecret: (value) => core.setSecret(value),
    setFailed: (message) => core.setFailed(message),
    async appendSummary(markdown) {
      await core.summary.addRaw(markdown, true).write();
    },
  };
}
