// Characters in label values that would make a folded name ambiguous or unsafe to show: the escape
// itself, the pair separator, controls and bidirectional formatting characters.
const ESCAPED = /[%,\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/gu;

/**
 * Folds a metric name and its labels into one Bellgate metric name, stably:
 * `name{b="2",a="1"}` -> `name/a=1,b=2`. Labels are sorted by key (code unit order); a sample
 * without labels keeps its bare name. In label values, `%`, `,`, control characters and
 * bidirectional formatting characters are percent-encoded as UTF-8 (`,` -> `%2C`, newline ->
 * `%0A`); everything else, `/` and `=` included, is kept, so the fold can be undone: the part
 * before the first `/` is the metric name (which cannot contain `/`), pairs split at `,`, and
 * each pair at its first `=` (label keys cannot contain `=`).
 * @example foldLabels('http_requests_total', [['path', '/api'], ['code', '200']]) // 'http_requests_total/code=200,path=/api'
 */
export function foldLabels(name: string, labels: ReadonlyArray<readonly [string, string]>): string {
  if (labels.length === 0) return name;
  const sorted = [...labels].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `${name}/${sorted.map(([key, value]) => `${key}=${escapeLabelValue(value)}`).join(',')}`;
}

/** Percent-encodes the characters listed in foldLabels. */
export function escapeLabelValue(value: string): string {
  return value.replace(ESCAPED, (c) => encodeURIComponent(c));
}
