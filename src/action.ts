import module from 'node:module';
import { warmUpAction } from './github/warm-up.js';

// Node >= 22.1 keeps compiled code between runs (the runner's node24 has it; on 20 this is a no-op).
// It covers only what loads after it, so the action itself is imported below, not statically
// (the warm-up is a few lines with dynamic imports only).
(module as { enableCompileCache?: () => unknown }).enableCompileCache?.();
// The action's chunk loads first; the config and metric readers start loading right behind it
// instead of after it (src/github/warm-up.ts).
const loadingAction = import('./github/start.js');
warmUpAction(process.env);
const { startAction } = await loadingAction;

await startAction();
