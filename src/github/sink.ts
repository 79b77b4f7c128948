/**
 * The one door through which the action talks to the runner: log lines, annotations, outputs, the
 * job summary, masking and the step's failure. The real sink is core-sink.ts's (@actions/core);
 * tests collect.
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
