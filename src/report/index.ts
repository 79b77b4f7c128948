/** Renderers of a gate Report: words and pictures for terminals, GitHub, machines and browsers. */
export { renderText } from './text.js';
export { renderMarkdown, MARKDOWN_LIMIT, type MarkdownOptions } from './markdown.js';
export { renderJson } from './json.js';
export { renderExplain, type ExplainInput } from './explain.js';
export { renderHtmlReport, type HtmlReportInput } from './html.js';
export { sparkline } from './sparkline.js';
export { escapeMarkdown, escapeHtml } from './escape.js';
export { cleanText, MAX_SHOWN_LENGTH } from './clean.js';
export { commentMarker, markerLine, safeMarker } from './marker.js';
export { formatNumber, formatValue, formatChange, formatSigma, formatDensity, formatAgainstCutoff } from './format.js';
export { STATUS_ORDER, STATUS_GLYPH, statusRank } from './status.js';
