// The entry of the action's bundle (test/build-dist.mjs); the action itself is src/action.ts.
// CommonJS on purpose: for a `.cjs` entry ncc emits a CommonJS bundle, which node starts without
// its ES module loader and whose chunks load with require: 5-8 ms less per PR check than the same
// code as ES modules (test/bench/README.md).
import('./action.ts');
