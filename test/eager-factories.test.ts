import { describe, expect, it } from 'vitest';
// @ts-expect-error: a plain .mjs build helper without types
import { eagerFactories } from './eager-factories.mjs';

type Rewrite = { text: string; rewritten: number; kept: number };
const rewrite = eagerFactories as (path: string, text: string, sourceType?: 'module' | 'script') => Rewrite;

/** Runs a chunk's factory table as webpack's runtime does (`factory.call(exports, module, exports, require)`). */
function runTable(chunk: string): Record<string, unknown> {
  const table = new Function(
    `${chunk.replace('export const modules=', 'const modules=')}; return modules;`,
  )() as Record<string, (this: unknown, ...args: unknown[]) => unknown>;
  const cache: Record<string, { exports: Record<string, unknown> }> = {};
  const require = (id: string): Record<string, unknown> => {
    if (cache[id]) return cache[id].exports;
    const module = (cache[id] = { exports: {} });
    table[id]!.call(module.exports, module, module.exports, require);
    return module.exports;
  };
  return Object.fromEntries(Object.keys(table).map((id) => [id, require(id)]));
}

describe('eagerFactories (build step: arrow module factories become function expressions)', () => {
  const chunk =
    'export const modules={' +
    '11:((module,exports,require)=>{const dep=require(12);exports.sum=dep.one+1;exports.inner=[1,2].map((x)=>x*2)}),' +
    '12:((module,exports)=>{exports.one=1;exports.arrowKept=(()=>{const f=(a)=>a;return f(3)})()}),' +
    '13:((module)=>{module.exports={self:this}}),' +
    '14:((module)=>{module.exports={count:typeof arguments}}),' +
    '15:((module)=>{module.exports={fromFunction:function(){return this}.call(7)}})' +
    '};';

  it('rewrites every factory that does not read this/arguments, and the table still gives the same exports', () => {
    const out = rewrite('chunk.js', chunk);
    expect(out.rewritten).toBe(3);
    expect(out.kept).toBe(2);
    expect(out.text).toContain('11:(function(module,exports,require){');
    expect(out.text).toContain('12:(function(module,exports){');
    expect(out.text).toContain('15:(function(module){');
    // Arrows inside a factory are not factories: they stay arrows.
    expect(out.text).toContain('map((x)=>x*2)');
    expect(out.text).toContain('13:((module)=>{');
    expect(out.text).toContain('14:((module)=>{');
    // Factories 13 and 14 would change meaning (this/arguments), so both tables must agree on them too;
    // 14 is not run because `arguments` at a module's top level is a ReferenceError in both forms.
    const runnable = (text: string): string => text.replace(/14:\(\(module\)=>\{[^}]*\}\}\),/, '');
    expect(runTable(runnable(out.text))).toEqual(runTable(runnable(chunk)));
  });

  it('finds the table of an entry file (`var __webpack_modules__=({...})`) and leaves other objects alone', () => {
    const entry = 'var __webpack_modules__=({5:((m)=>{m.exports=1})});const other={6:((m)=>{m.exports=2})};';
    const out = rewrite('index.js', entry);
    expect(out.text).toBe(
      'var __webpack_modules__=({5:(function(m){m.exports=1})});const other={6:((m)=>{m.exports=2})};',
    );
  });

  it('finds the table of a CommonJS chunk (`exports.modules={...}`)', () => {
    const out = rewrite(
      '1.index.cjs.js',
      'exports.id=1;exports.ids=[1];exports.modules={7:((m,e,r)=>{e.x=r(8)})};',
      'script',
    );
    expect(out.text).toBe('exports.id=1;exports.ids=[1];exports.modules={7:(function(m,e,r){e.x=r(8)})};');
  });

  it('refuses text it cannot parse instead of writing a broken bundle', () => {
    expect(() => rewrite('bad.js', 'export const modules={1:((m)=>{')).toThrow(/cannot parse bad\.js/);
  });
});
