import { createRealDeps } from './real-deps.js';
import { runAction, type ActionResult } from './run-action.js';

/**
 * Runs the action with the real runner, file system and GitHub API: what src/action.ts loads,
 * as one module so the bundle puts it in one chunk.
 * @example await startAction() // the outcome reaches the runner as workflow commands and files
 */
export function startAction(): Promise<ActionResult> {
  return runAction(createRealDeps());
}
