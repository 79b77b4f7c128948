import module from 'node:module';

// Node >= 22.1 keeps compiled code between runs (the runner's node24 has it; on 20 this is a no-op).
// It covers only what loads after it, so the action itself is imported below, not statically.
(module as { enableCompileCache?: () => unknown }).enableCompileCache?.();
const { startAction } = await import('./github/start.js');

await startAction();
