// Rewrites the module factories of an ncc/webpack bundle file from arrow functions to plain
// function expressions: `17:((module,exports)=>{...})` becomes `17:(function(module,exports){...})`.
//
// Why: V8 compiles a function expression that follows "(" at once, with the file, but an arrow
// function only when it is first called, after a second full parse. Every factory of a chunk we load
// is called, so the arrow form parses each module twice: measured on the action's PR check, the
// factories' lazy compiles cost about 16 ms of a 100 ms run.
//
// Same behaviour: webpack itself writes `function` factories when told the target has no arrows, and
// the runtime calls each as `factory.call(module.exports, module, exports, require)`. A factory whose
// own body (outside nested non-arrow functions) reads `this`, `arguments` or `new.target` would see a
// different value, so those are left as arrows.
import { parseSync } from 'rolldown/utils';

/** The names webpack/ncc give the object that maps module ids to factories (`const modules =` in an
 * ES module chunk, `exports.modules =` in a CommonJS one, `var __webpack_modules__ =` in an entry). */
const FACTORY_TABLES = new Set(['modules', '__webpack_modules__']);

/**
 * @param sourceType 'module', or 'script' for a CommonJS bundle file.
 * @returns the rewritten text and how many factories were rewritten or left as arrows.
 * @example eagerFactories('c.js', 'export const modules={1:((m)=>{m.x=1})};').text
 *   // 'export const modules={1:(function(m){m.x=1})};'
 */
export function eagerFactories(path, text, sourceType = 'module') {
  const parsed = parseSync(path, text, { sourceType });
  if (parsed.errors.length > 0) throw new Error(`cannot parse ${path}: ${parsed.errors[0].message}`);
  const edits = [];
  let kept = 0;
  for (const factory of factoriesOf(parsed.program)) {
    if (readsOwnBinding(factory.body)) {
      kept += 1;
      continue;
    }
    const params = factory.params.map((p) => text.slice(p.start, p.end)).join(',');
    edits.push({ from: factory.start, to: factory.body.start, text: `function(${params})` });
  }
  let out = text;
  for (const edit of edits.sort((a, b) => b.from - a.from))
    out = out.slice(0, edit.from) + edit.text + out.slice(edit.to);
  return { text: out, rewritten: edits.length, kept };
}

/** Arrow factories with a block body, found as the values of a `modules`/`__webpack_modules__` table. */
function factoriesOf(program) {
  const found = [];
  const visit = (node) => {
    if (node === null || typeof node !== 'object') return;
    if (Array.isArray(node)) {
      for (const child of node) visit(child);
      return;
    }
    if (node.type === 'VariableDeclarator' && node.id?.type === 'Identifier' && FACTORY_TABLES.has(node.id.name)) {
      collect(unwrap(node.init));
      return;
    }
    const target = node.type === 'AssignmentExpression' ? node.left : undefined;
    if (
      target?.type === 'MemberExpression' &&
      target.object.name === 'exports' &&
      FACTORY_TABLES.has(target.property.name)
    ) {
      collect(unwrap(node.right));
      return;
    }
    for (const key of Object.keys(node)) if (key !== 'parent') visit(node[key]);
  };
  const collect = (table) => {
    if (table?.type !== 'ObjectExpression') return;
    for (const property of table.properties) {
      const value = unwrap(property.value);
      if (value?.type === 'ArrowFunctionExpression' && !value.async && value.body.type === 'BlockStatement')
        found.push(value);
    }
  };
  visit(program);
  return found;
}

function unwrap(node) {
  return node?.type === 'ParenthesizedExpression' ? node.expression : node;
}

/** Whether `this`, `arguments` or `new.target` is read where an arrow and a function differ. */
function readsOwnBinding(body) {
  let found = false;
  const visit = (node) => {
    if (found || node === null || typeof node !== 'object') return;
    if (Array.isArray(node)) {
      for (const child of node) visit(child);
      return;
    }
    if (
      node.type === 'ThisExpression' ||
      node.type === 'MetaProperty' ||
      (node.type === 'Identifier' && node.name === 'arguments')
    ) {
      found = true;
      return;
    }
    // These bring their own this/arguments; class bodies their own this.
    if (['FunctionDeclaration', 'FunctionExpression', 'ClassBody'].includes(node.type)) return;
    for (const key of Object.keys(node)) if (key !== 'parent') visit(node[key]);
  };
  visit(body);
  return found;
}
