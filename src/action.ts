import { createRealDeps } from './github/real-deps.js';
import { runAction } from './github/run-action.js';

// The action's entry (action.yml runs its bundle, dist/index.js): the real runner, file system and
// GitHub API; every failure reaches the runner through runAction's sink, never as a throw.
await runAction(createRealDeps());
