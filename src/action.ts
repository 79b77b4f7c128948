import module from 'node:module';
import { warmUpAction } from './github/warm-up.js';

// Node >= 22.1 keeps compiled code between runs (the runner's node24 has it; on 20 this is a no-op).
// It covers only what loads after it, so the action itself is imported below, not statically
// (the warm-up is a few lines with dynamic imports only).
(module as { enableCompileCache?: () => unknown }).enableCompileCache?.();
// The config and metric readers start loading now, beside the action's chunk (src/github/warm-up.ts).
warmUpAction(process.env);
const { startAction } = await import('./github/start.js');

await startAction();
