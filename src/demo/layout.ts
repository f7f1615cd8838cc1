/**
 * Sheet addresses derived from one ordered list, so a layout is written once: the formulas that
 * refer to a cell, the code that fills it and the readers of the results all take its address
 * from here, and moving a row or a column is editing the list.
 */

/** The column letter of a 1-based column number: 1 → A, 27 → AA. */
export function columnLetter(n: number): string {
  let s = '';
  for (let k = n; k > 0; k = Math.floor((k - 1) / 26)) s = String.fromCharCode(65 + ((k - 1) % 26)) + s;
  return s;
}

/** Column letters for keys in order from column A: `columnsOf(['id', 'kva'])` → `{ id: 'A', kva: 'B' }`. */
export function columnsOf<const K extends string>(keys: readonly K[]): { readonly [k in K]: string } {
  return Object.fromEntries(keys.map((k, i) => [k, columnLetter(i + 1)])) as { [k in K]: string };
}

/**
 * Cells of one column for rows listed in order from `firstRow`; a null entry is a row with no
 * named cell (a blank row or a heading). `cellsOf('B', ['kva', null, 'rate'], 4)` → `{ kva: 'B4', rate: 'B6' }`.
 */
export function cellsOf<const K extends string>(column: string, rows: readonly (K | null)[], firstRow = 1): { readonly [k in K]: string } {
  const out: Partial<Record<K, string>> = {};
  rows.forEach((k, i) => {
    if (k !== null) out[k] = `${column}${firstRow + i}`;
  });
  return out as { [k in K]: string };
}

/** The absolute form of a cell address, for a formula copied down a table: B4 → $B$4. */
export const absolute = (cell: string): string => cell.replace(/^([A-Z]+)(\d+)$/, '$$$1$$$2');
