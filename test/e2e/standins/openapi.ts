/**
 * Holds the loopback stand-ins of the GitHub REST API to GitHub's own published description
 * (the `@octokit/openapi` package: api.github.com.json, OpenAPI 3). Every request the action makes
 * is matched to a documented operation by method and path template, its path and query
 * parameters are checked against their schemas (an undocumented query parameter is an error), and
 * its JSON body against the operation's request body schema; every answer a stand-in serves is
 * checked against the documented response of that status. A request the description does not
 * know is a violation. Schemas are compiled by ajv on first use, with the description added whole
 * so its `$ref`s resolve; OpenAPI's `nullable` is read by ajv itself where the schema has a `type`,
 * and rewritten as `anyOf [schema, null]` where it has none (ajv refuses `nullable` alone).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Ajv, type ValidateFunction } from 'ajv';

type Json = Record<string, unknown>;

interface Operation {
  method: string;
  template: string;
  pattern: RegExp;
  names: string[];
  /** Literal characters of the template: the more literal, the more specific a match is. */
  literal: number;
  spec: Json;
  pointer: string;
}

export interface ApiCheck {
  /** The documented operation of a request, or why there is none; `problems` lists every mismatch. */
  request(method: string, url: URL, body: unknown): { operation?: Operation; problems: string[] };
  /** Mismatches of an answer with the operation's documented response for that status. */
  response(operation: Operation, status: number, body: unknown): string[];
}

const require = createRequire(import.meta.url);
const GENERIC_ERRORS = new Set([401, 403, 404, 429, 500, 502, 503]);
const DOC = 'https://api.github.com/openapi.json';
let shared: ApiCheck | undefined;

/** GitHub's REST description, loaded once per test process (13 MB of JSON). */
export function githubApiCheck(): ApiCheck {
  shared ??= build(
    JSON.parse(readFileSync(require.resolve('@octokit/openapi/generated/api.github.com.json'), 'utf8')) as Json,
  );
  return shared;
}

const escapePointer = (s: string): string => s.replace(/~/g, '~0').replace(/\//g, '~1');

/** OpenAPI 3.0 allows `nullable` beside `allOf`/`anyOf`/`$ref` without a `type`; JSON Schema says it as anyOf. */
function nullableWithoutType(node: unknown): unknown {
  if (Array.isArray(node)) return node.map(nullableWithoutType);
  if (node === null || typeof node !== 'object') return node;
  const out: Json = {};
  for (const [key, value] of Object.entries(node as Json)) out[key] = nullableWithoutType(value);
  if (out.nullable !== true || 'type' in out) return out;
  const { nullable: _nullable, description, ...rest } = out;
  return { ...(description === undefined ? {} : { description }), anyOf: [rest, { type: 'null' }] };
}

function build(original: Json): ApiCheck {
  const doc = nullableWithoutType(original) as Json;
  const ajv = new Ajv({ strict: false, validateSchema: false, validateFormats: false, allErrors: true });
  ajv.addSchema({ ...doc, $id: DOC });
  const compiled = new Map<string, ValidateFunction>();
  const validator = (pointer: string): ValidateFunction => {
    let v = compiled.get(pointer);
    if (v === undefined) {
      v = ajv.compile({ $ref: `${DOC}#${pointer}` });
      compiled.set(pointer, v);
    }
    return v;
  };
  const resolve = (node: unknown): Json => {
    let n = node as Json;
    for (let i = 0; i < 10 && typeof n?.$ref === 'string'; i++) {
      n = (n.$ref as string)
        .slice(2)
        .split('/')
        .reduce<unknown>((o, k) => (o as Json)[k.replace(/~1/g, '/').replace(/~0/g, '~')], doc) as Json;
    }
    return n;
  };

  const operations: Operation[] = [];
  for (const [template, item] of Object.entries(doc.paths as Json)) {
    for (const [method, spec] of Object.entries(item as Json)) {
      if (!['get', 'post', 'put', 'patch', 'delete'].includes(method)) continue;
      const names: string[] = [];
      // A ref or a content path may hold slashes (`heads/main`, `bellgate/series.json`).
      const source = template.replace(/[.*+?^$()|[\]\\]/g, '\\$&').replace(/\{([^}]+)\}/g, (_m, name: string) => {
        names.push(name);
        return name === 'ref' || name === 'path' ? '(.+)' : '([^/]+)';
      });
      operations.push({
        method: method.toUpperCase(),
        template,
        pattern: new RegExp(`^${source}$`),
        names,
        literal: template.replace(/\{[^}]+\}/g, '').length,
        spec: spec as Json,
        pointer: `/paths/${escapePointer(template)}/${method}`,
      });
    }
  }

  const check = (pointer: string, value: unknown, what: string): string[] => {
    const v = validator(pointer);
    if (v(value)) return [];
    return (v.errors ?? []).slice(0, 5).map((e) => `${what}${e.instancePath} ${e.message ?? 'is invalid'}`);
  };
  /** A parameter's text as its schema's type reads it (query and path values are strings). */
  const typed = (schema: Json, text: string): unknown => {
    const type = schema.type;
    if ((type === 'integer' || type === 'number') && /^-?\d+(\.\d+)?$/.test(text)) return Number(text);
    if (type === 'boolean' && (text === 'true' || text === 'false')) return text === 'true';
    return text;
  };

  return {
    request(method, url, body) {
      const candidates = operations
        .filter((o) => o.method === method && o.pattern.test(url.pathname))
        .sort((a, b) => b.literal - a.literal);
      const operation = candidates[0];
      if (operation === undefined)
        return { problems: [`${method} ${url.pathname} is not an operation of GitHub's REST description`] };
      const problems: string[] = [];
      const params = ((operation.spec.parameters as unknown[] | undefined) ?? []).map((p, i) => ({
        p: resolve(p),
        i,
        raw: p as Json,
      }));
      const values = operation.pattern.exec(url.pathname)!.slice(1);
      const where = `${method} ${operation.template}`;
      const pointerOf = (raw: Json, i: number): string =>
        typeof raw.$ref === 'string'
          ? `${(raw.$ref as string).slice(1)}/schema`
          : `${operation.pointer}/parameters/${i}/schema`;
      for (const { p, i, raw } of params) {
        const name = String(p.name);
        const schema = resolve(p.schema);
        if (p.in === 'path') {
          const text = decodeURIComponent(values[operation.names.indexOf(name)] ?? '');
          problems.push(...check(pointerOf(raw, i), typed(schema, text), `${where}: path parameter ${name}`));
        } else if (p.in === 'query') {
          const text = url.searchParams.get(name);
          if (text === null) {
            if (p.required === true) problems.push(`${where}: query parameter ${name} is required`);
            continue;
          }
          problems.push(...check(pointerOf(raw, i), typed(schema, text), `${where}: query parameter ${name}`));
        }
      }
      const known = new Set(params.filter(({ p }) => p.in === 'query').map(({ p }) => String(p.name)));
      for (const name of url.searchParams.keys())
        if (!known.has(name)) problems.push(`${where}: query parameter ${name} is not documented`);
      const requestBody = resolve(operation.spec.requestBody);
      const content = (requestBody?.content as Json | undefined)?.['application/json'];
      if (body !== undefined) {
        if (content === undefined) problems.push(`${where}: takes no JSON body`);
        else
          problems.push(
            ...check(
              typeof (operation.spec.requestBody as Json).$ref === 'string'
                ? `${((operation.spec.requestBody as Json).$ref as string).slice(1)}/content/application~1json/schema`
                : `${operation.pointer}/requestBody/content/application~1json/schema`,
              body,
              `${where}: body`,
            ),
          );
      } else if (requestBody?.required === true) {
        problems.push(`${where}: a JSON body is required`);
      }
      return { operation, problems };
    },
    response(operation, status, body) {
      const where = `${operation.method} ${operation.template} answered ${status}`;
      const responses = operation.spec.responses as Json;
      const raw = responses[String(status)] as Json | undefined;
      // Any operation may be refused for a token's permissions or rate limit, answer 404 for a
      // resource that is gone (or hidden from the token), or fail on the server (GitHub's REST
      // docs, "Troubleshooting the REST API"), with a basic-error body.
      if (raw === undefined && GENERIC_ERRORS.has(status))
        return check('/components/schemas/basic-error', body, `${where}: body`);
      if (raw === undefined) return [`${where}, which the description does not document`];
      const response = resolve(raw);
      const content = (response.content as Json | undefined)?.['application/json'] as Json | undefined;
      if (content?.schema === undefined) return body === undefined ? [] : [];
      const pointer =
        typeof raw.$ref === 'string'
          ? `${(raw.$ref as string).slice(1)}/content/application~1json/schema`
          : `${operation.pointer}/responses/${status}/content/application~1json/schema`;
      return check(pointer, body, `${where}: body`);
    },
  };
}
