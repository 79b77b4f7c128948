/**
 * The one door through which the action talks to the runner: log lines, annotations, outputs, the
 * job summary, masking and the step's failure. The real sink is @actions/core's; tests collect.
 */
export interface AnnotationProps {
  title?: string;
  file?: string;
  startLine?: number;
}

export interface ActionSink {
  info(message: string): void;
  warning(message: string, props?: AnnotationProps): void;
  error(message: string, props?: AnnotationProps): void;
  notice(message: string, props?: AnnotationProps): void;
  setOutput(name: string, value: string): void;
  /** Masks a value in every later log line. */
  setSecret(value: string): void;
  setFailed(message: string): void;
  /** Appends markdown to the job summary (GITHUB_STEP_SUMMARY); written once per run. */
  appendSummary(markdown: string): Promise<void>;
}

/**
 * The sink over @actions/core (workflow commands on stdout, GITHUB_OUTPUT, GITHUB_STEP_SUMMARY).
 * @example createCoreSink(await import('@actions/core')).info('hello')
 */
export function createCoreSink(core: typeof import('@actions/core')): ActionSink {
  return {
    info: (m) => core.info(m),
    warning: (m, p) => core.warning(m, p),
    error: (m, p) => core.error(m, p),
    notice: (m, p) => core.notice(m, p),
    setOutput: (n, v) => core.setOutput(n, v),
    setSecret: (v) => core.setSecret(v),
    setFailed: (m) => core.setFailed(m),
    appendSummary: async (md) => {
      await core.summary.addRaw(md, true).write();
    },
  };
}
