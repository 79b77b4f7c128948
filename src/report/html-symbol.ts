import { symbol, symbolCircle, symbolCross, symbolDiamond, symbolTriangle, type SymbolType } from 'd3-shape';
import type { Status } from '../gate/report.js';

/** The shape that marks this run in the charts, the same meaning as STATUS_GLYPH in tables. */
const SHAPES: Readonly<Record<Status, { type: SymbolType; rotate: number }>> = {
  regressed: { type: symbolTriangle, rotate: 0 },
  improved: { type: symbolTriangle, rotate: 180 },
  missing: { type: symbolCross, rotate: 45 },
  ok: { type: symbolCircle, rotate: 0 },
  learning: { type: symbolDiamond, rotate: 0 },
  new: { type: symbolCross, rotate: 0 },
  ignored: { type: symbolDiamond, rotate: 0 },
};

/**
 * An SVG path for this run's marker at (x, y), drawn by d3-shape's symbol generator, with a
 * tooltip. `titleHtml` must already be escaped.
 */
export function statusSymbol(status: Status, x: number, y: number, titleHtml: string, area = 110): string {
  const shape = SHAPES[status];
  const d = symbol(shape.type, area)() ?? '';
  return `<path class="run-mark s-${status}" d="${d}" transform="translate(${x},${y}) rotate(${shape.rotate})"><title>${titleHtml}</title></path>`;
}
