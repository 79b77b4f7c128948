/** SVG coordinates with two decimals: enough for a screen, and non-finite values never leak in. */
export const px = (x: number): number => (Number.isFinite(x) ? Math.round(x * 100) / 100 : 0);

/**
 * One SVG element as text: numbers in `attrs` are rounded to two decimals (non-finite ones to 0,
 * see px), strings are written as given and must already be escaped; `titleHtml` (escaped) becomes
 * the element's tooltip.
 * @example svgElement('circle', { cx: 1.234, cy: 2, r: 3 }) // '<circle cx="1.23" cy="2" r="3"/>'
 */
export function svgElement(tag: string, attrs: Readonly<Record<string, string | number>>, titleHtml?: string): string {
  const list = Object.entries(attrs)
    .map(([k, v]) => `${k}="${typeof v === 'number' ? px(v) : v}"`)
    .join(' ');
  return titleHtml === undefined ? `<${tag} ${list}/>` : `<${tag} ${list}><title>${titleHtml}</title></${tag}>`;
}

/** The outer <svg> of a chart, sized and labelled for screen readers (`titleHtml` escaped). */
export function chartSvg(width: number, height: number, titleHtml: string, body: string): string {
  const size = `viewBox="0 0 ${width} ${height}" width="${width}" height="${height}"`;
  return `<svg class="chart" ${size} role="img" aria-label="${titleHtml}"><title>${titleHtml}</title>${body}</svg>`;
}

/** An SVG <text> element; `textHtml` must already be escaped. */
export function textElement(attrs: Readonly<Record<string, string | number>>, textHtml: string): string {
  return svgElement('text', attrs).replace(/\/>$/, `>${textHtml}</text>`);
}
