/**
 * The report's inline stylesheet. Status colours always come with a word and a shape; print
 * turns the page black on white, keeps charts whole on a page and hides the sort hints.
 */
export const HTML_STYLE = `
:root { --fg: #1f2328; --muted: #59636e; --bg: #fff; --line: #d1d9e0; --band: #dbeafe; --mean: #1d4ed8;
  --bad: #b91c1c; --good: #15803d; --warn: #a16207; --dot: #374151; }
@media (prefers-color-scheme: dark) { :root { --fg: #e6edf3; --muted: #9198a1; --bg: #0d1117; --line: #3d444d;
  --band: #1e3a5f; --mean: #93c5fd; --bad: #f87171; --good: #4ade80; --warn: #facc15; --dot: #c9d1d9; } }
* { box-sizing: border-box; }
body { font: 14px/1.45 system-ui, -apple-system, "Segoe UI", sans-serif; color: var(--fg); background: var(--bg);
  margin: 0 auto; padding: 1.5rem; max-width: 1080px; }
h1 { font-size: 1.5rem; margin: 0 0 .25rem; } h2 { font-size: 1.15rem; margin: 0 0 .25rem; overflow-wrap: anywhere; }
.meta, .reason, .note-text { color: var(--muted); }
.verdict { font-size: 1.1rem; margin: .5rem 0 1rem; }
.report-note { border-left: 4px solid #d29922; padding: .25rem .75rem; margin: .5rem 0; }
table { border-collapse: collapse; width: 100%; margin-bottom: 1.5rem; }
th, td { text-align: left; padding: .3rem .5rem; border-bottom: 1px solid var(--line); vertical-align: top; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
td:first-child { white-space: nowrap; }
td.name { overflow-wrap: anywhere; max-width: 22rem; }
th button { font: inherit; font-weight: 600; color: inherit; background: none; border: 0; padding: 0; cursor: pointer; }
th button::after { content: " ↕"; color: var(--muted); }
th[aria-sort="ascending"] button::after { content: " ↑"; } th[aria-sort="descending"] button::after { content: " ↓"; }
.s-regressed { color: var(--bad); font-weight: 600; } .s-improved { color: var(--good); } .s-missing { color: var(--warn); }
.s-learning, .s-new, .s-ignored { color: var(--muted); }
section.metric { border-top: 1px solid var(--line); padding: 1rem 0; }
.charts { display: flex; flex-wrap: wrap; gap: 1rem; }
svg.chart { max-width: 100%; height: auto; overflow: visible; }
svg text { fill: var(--fg); font-size: 11px; } svg .axis line { stroke: var(--muted); } svg .axis-label { font-size: 12px; }
svg .band { fill: var(--band); } svg .mean { stroke: var(--mean); stroke-dasharray: 6 4; fill: none; stroke-width: 1.5; }
svg .trace { stroke: var(--dot); stroke-opacity: .45; fill: none; } svg .point { fill: var(--dot); }
svg .bin { fill: var(--band); stroke: var(--mean); stroke-width: .5; } svg .curve { stroke: var(--mean); fill: none; stroke-width: 2; }
svg .cutoff { stroke: var(--warn); stroke-dasharray: 4 3; stroke-width: 1.5; } svg .now { stroke: var(--fg); stroke-dasharray: 2 2; }
svg .run-mark { fill: var(--fg); stroke: var(--bg); stroke-width: 1; }
svg .run-mark.s-regressed { fill: var(--bad); } svg .run-mark.s-improved { fill: var(--good); }
svg .note { font-size: 11px; paint-order: stroke; stroke: var(--bg); stroke-width: 3px; }
section.since { border-top: 2px solid var(--line); padding: 1rem 0; } .since-metric h3 { font-size: 1rem; margin: .75rem 0 .25rem; }
svg .since-ref { stroke: var(--fg); stroke-width: 1.5; } svg .since-step { stroke: var(--bad); stroke-dasharray: 3 2; stroke-width: 1.5; }
.legend { color: var(--muted); font-size: 12px; margin: .25rem 0 0; }
footer { color: var(--muted); font-size: 12px; margin-top: 2rem; }
@media print {
  :root { --fg: #000; --muted: #333; --bg: #fff; --band: #e5e7eb; --mean: #000; --bad: #000; --good: #000; --warn: #000; --dot: #000; }
  body { padding: 0; max-width: none; font-size: 11pt; }
  th button::after { content: ""; }
  section.metric { break-inside: avoid; page-break-inside: avoid; }
  a { color: inherit; text-decoration: none; }
}
`;
