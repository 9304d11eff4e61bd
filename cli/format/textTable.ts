/**
 * Plain-text tables for command-line summaries: columns padded to their
 * widest cell, numbers right-aligned. Reusable by every verb.
 */
export type ColumnAlign = 'left' | 'right';

export interface TextColumn {
  readonly header: string;
  readonly align: ColumnAlign;
}

/** Columns of words (labels, names), left-aligned. */
export function textColumns(...headers: readonly string[]): TextColumn[] {
  return headers.map((header) => ({ header, align: 'left' }));
}

/** Columns of figures, right-aligned so their digits line up. */
export function numberColumns(...headers: readonly string[]): TextColumn[] {
  return headers.map((header) => ({ header, align: 'right' }));
}

/** Rows under a header line and a rule, two spaces between columns, each line indented by `indent`. */
export function formatTable(columns: readonly TextColumn[], rows: readonly (readonly string[])[], indent = '  '): string {
  const widths = columns.map((c, i) => Math.max(c.header.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: readonly string[]): string =>
    indent +
    columns
      .map((c, i) => {
        const cell = cells[i] ?? '';
        return c.align === 'right' ? cell.padStart(widths[i]!) : cell.padEnd(widths[i]!);
      })
      .join('  ')
      .trimEnd();
  const rule = indent + widths.map((w) => '-'.repeat(w)).join('  ');
  return [line(columns.map((c) => c.header)), rule, ...rows.map(line)].join('\n');
}

/** Label/value pairs as two aligned columns (for headline figures). */
export function formatPairs(pairs: readonly (readonly [string, ...string[]])[], indent = '  '): string {
  const count = Math.max(...pairs.map((p) => p.length));
  const widths = Array.from({ length: count }, (_, i) => Math.max(...pairs.map((p) => (p[i] ?? '').length)));
  return pairs
    .map((p) => indent + p.map((cell, i) => (i === 0 ? cell.padEnd(widths[i]!) : cell.padStart(widths[i]!))).join('  ').trimEnd())
    .join('\n');
}
