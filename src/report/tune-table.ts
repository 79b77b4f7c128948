/**
 * A plain text table: columns padded to their widest cell, aligned by `align` ('l' left for
 * names, 'r' right for numbers; columns past its end are right-aligned), two spaces between
 * columns. Cells must already be clean.
 * @example textTable([['a', '1'], ['bb', '22']], 'lr') // 'a    1\nbb  22'
 */
export function textTable(rows: readonly (readonly string[])[], align = 'l'): string {
  const widths: number[] = [];
  for (const row of rows) row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, Array.from(cell).length)));
  return rows
    .map((row) =>
      row
        .map((cell, i) => {
          const pad = ' '.repeat(widths[i]! - Array.from(cell).length);
          return align[i] === 'l' ? cell + pad : pad + cell;
        })
        .join('  ')
        .trimEnd(),
    )
    .join('\n');
}
