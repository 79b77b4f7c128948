import { createRealDeps } from './github/real-deps.js';
import { runAction } from './github/run-action.js';

await runAction(createRealDeps());
