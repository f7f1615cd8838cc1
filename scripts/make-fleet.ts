/**
 * Writes a large fleet workbook for timing `fluxbook calc`: ROWS units (invented, cycled from the
 * Fernhill Works fleet with a varying load) with 4 XFMR formulas each.
 * Run: npx tsx scripts/make-fleet.ts OUT.xlsx [ROWS=10000]; then time node dist/cli/fluxbook.js calc OUT.xlsx --out …
 */
import ExcelJS from 'exceljs';
import { FLEET, measuredRatio } from '../src/demo';

export function largeFleetWorkbook(rows: number): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  const ws = wb.addWorksheet('Fleet');
  ws.addRow(['Unit', 'kVA', 'HV (V)', 'LV (V)', 'Vector group', 'No-load loss (W)', 'Load loss (W)', 'Load', 'Measured ratio', 'Efficiency', 'Losses (W)', 'Ratio deviation', 'Rated current (A)']);
  for (let i = 0; i < rows; i++) {
    const u = FLEET[i % FLEET.length]!;
    const r = i + 2;
    ws.addRow([
      `U-${String(i + 1).padStart(5, '0')}`,
      u.kva,
      u.hvV,
      u.lvV,
      u.vectorGroup,
      u.p0W,
      u.pkW,
      0.2 + ((i * 37) % 90) / 100,
      measuredRatio(u),
      { formula: `XFMR.EFF(B${r},F${r},G${r},H${r})` },
      { formula: `XFMR.LOSSES(F${r},G${r},H${r})` },
      { formula: `XFMR.RATIODEV(I${r},C${r},D${r},E${r})` },
      { formula: `XFMR.IRATED(B${r},D${r})` },
    ]);
  }
  return wb;
}

if (require.main === module) {
  const out = process.argv[2];
  if (!out) throw new Error('usage: npx tsx scripts/make-fleet.ts OUT.xlsx [ROWS]');
  const rows = Number(process.argv[3] ?? 10_000);
  void largeFleetWorkbook(rows).xlsx.writeFile(out).then(() => console.log(`${out}: ${rows} rows × 4 XFMR formulas`));
}
