/**
 * The bids workbook: three fictional offers for one 1000 kVA three-phase liquid-immersed unit
 * compared by total owning cost, with the US DOE 2016 efficiency check of each. The story the
 * figures tell: the cheapest offer to buy is the dearest to own and misses the DOE minimum; of the
 * two that pass, the lower losses of the dearest-to-buy one nearly, but not quite, pay back its price.
 */
import type ExcelJS from 'exceljs';
import { SAFETY_NOTE } from '../cells/metadata';
import { absolute, cellsOf, columnsOf } from './layout';
import { BIDS_INVENTED, EVALUATION, type Offer, OFFERS } from './scenario';
import { demoWorkbook } from './sheet';

/** The evaluation inputs, in order from this row (its heading is the row above). */
const INPUT_ROW = 4;
const INPUTS = ['kva', 'priceKwh', 'rate', 'years', 'lossFactor', 'peakLoad', 'aFactor', 'bFactor', 'doeMinimum'] as const;

/** Columns of the offers table, whose first offer is on OFFER_ROW (headings on the row above). */
export const OFFER_COLUMNS = columnsOf(['name', 'price', 'p0', 'pk', 'efficiency', 'complies', 'p0Worth', 'pkWorth', 'toc', 'compliantToc']);
export const OFFER_ROW = INPUT_ROW + INPUTS.length + 2;

/** The verdicts, in order from the second row below the last offer. */
const VERDICTS = ['lowestCompliantToc', 'recommended', 'cheapestToBuy'] as const;

/** Cells of the bid sheet's values (labels stand beside them in column A), so formulas, readers and tests agree. */
export const BID_CELLS = {
  ...cellsOf('B', INPUTS, INPUT_ROW),
  ...cellsOf('B', VERDICTS, OFFER_ROW + OFFERS.length + 1),
};
const labelOf = (cell: string): string => cell.replace(/^B/, 'A');

export function bidWorkbook(offers: readonly Offer[] = OFFERS): ExcelJS.Workbook {
  const wb = demoWorkbook('Fernhill Works bids by total owning cost');
  const ws = wb.addWorksheet('Bids');
  const e = EVALUATION;
  const b = BID_CELLS;
  ws.getCell('A1').value = `Fernhill Works: offers for one ${e.kva} kVA three-phase liquid-immersed unit, compared by total owning cost`;
  ws.getCell('A1').font = { bold: true };
  ws.getCell(`A${INPUT_ROW - 1}`).value = 'Evaluation inputs';
  ws.getCell(`A${INPUT_ROW - 1}`).font = { bold: true };
  const inputs: Record<(typeof INPUTS)[number], [string, ExcelJS.CellValue, string?]> = {
    kva: ['Rating (kVA)', e.kva],
    priceKwh: ['Energy price (per kWh)', e.priceKwh, '0.000'],
    rate: ['Interest rate a year', e.rate, '0.0%'],
    years: ['Evaluation period (years)', e.years],
    lossFactor: ['Loss factor of the loading', e.lossFactor, '0.00'],
    peakLoad: ['Peak load (per unit)', e.peakLoad, '0.00'],
    aFactor: ['A factor: worth of 1 W of no-load loss', { formula: `XFMR.AFACTOR(${b.priceKwh},${b.rate},${b.years})` }, '#,##0.00'],
    bFactor: ['B factor: worth of 1 W of load loss', { formula: `XFMR.BFACTOR(${b.priceKwh},${b.lossFactor},${b.peakLoad},${b.rate},${b.years})` }, '#,##0.00'],
    doeMinimum: ['US DOE 2016 minimum efficiency at 50 % load', { formula: `XFMR.DOEMIN(${b.kva},"liquid",3,2016)` }, '0.00%'],
  };
  for (const key of INPUTS) {
    const [label, value, fmt] = inputs[key];
    ws.getCell(labelOf(b[key])).value = label;
    ws.getCell(b[key]).value = value;
    if (fmt) ws.getCell(b[key]).numFmt = fmt;
  }

  const c = OFFER_COLUMNS;
  const head = ws.getRow(OFFER_ROW - 1);
  head.values = [
    'Offer',
    'Price',
    'No-load loss P0 (W)',
    'Load loss Pk (W)',
    'Efficiency at 50 % load',
    'Meets DOE 2016',
    'Worth of the no-load loss',
    'Worth of the load loss',
    'Total owning cost',
    'Total owning cost if compliant',
  ];
  head.font = { bold: true };
  offers.forEach((o, i) => {
    const r = OFFER_ROW + i;
    const at = (col: string) => `${col}${r}`;
    ws.getCell(at(c.name)).value = o.name;
    ws.getCell(at(c.price)).value = o.price;
    ws.getCell(at(c.p0)).value = o.p0W;
    ws.getCell(at(c.pk)).value = o.pkW;
    ws.getCell(at(c.efficiency)).value = { formula: `XFMR.EFF(${absolute(b.kva)},${at(c.p0)},${at(c.pk)},0.5)` };
    ws.getCell(at(c.complies)).value = { formula: `XFMR.COMPLIES(${absolute(b.kva)},${at(c.p0)},${at(c.pk)},"DOE","liquid",3,2016)` };
    ws.getCell(at(c.p0Worth)).value = { formula: `${absolute(b.aFactor)}*${at(c.p0)}` };
    ws.getCell(at(c.pkWorth)).value = { formula: `${absolute(b.bFactor)}*${at(c.pk)}` };
    ws.getCell(at(c.toc)).value = { formula: `XFMR.TOC(${at(c.price)},${at(c.p0)},${at(c.pk)},${absolute(b.aFactor)},${absolute(b.bFactor)})` };
    // Text for a failing offer, which MIN leaves out of a range.
    ws.getCell(at(c.compliantToc)).value = { formula: `IF(${at(c.complies)},${at(c.toc)},"fails DOE 2016")` };
  });
  const first = OFFER_ROW;
  const lastRow = OFFER_ROW + offers.length - 1;
  const col = (letter: string) => `${letter}${first}:${letter}${lastRow}`;
  const verdicts: Record<(typeof VERDICTS)[number], [string, string, string?]> = {
    lowestCompliantToc: ['Lowest total owning cost among compliant offers', `MIN(${col(c.compliantToc)})`, '#,##0'],
    recommended: ['Recommended offer', `INDEX(${col(c.name)},MATCH(${b.lowestCompliantToc},${col(c.compliantToc)},0))`],
    cheapestToBuy: ['Cheapest to buy', `INDEX(${col(c.name)},MATCH(MIN(${col(c.price)}),${col(c.price)},0))`],
  };
  for (const key of VERDICTS) {
    const [label, formula, fmt] = verdicts[key];
    ws.getCell(labelOf(b[key])).value = label;
    ws.getCell(b[key]).value = { formula };
    if (fmt) ws.getCell(b[key]).numFmt = fmt;
  }
  ws.getCell(`A${lastRow + 7}`).value =
    'Losses as offered at the DOE test method’s reference temperatures (no-load loss at 20 °C, load loss at 55 °C); TOC = price + A × P0 + B × Pk.';
  ws.getCell(`A${lastRow + 8}`).value = BIDS_INVENTED;
  ws.getCell(`A${lastRow + 9}`).value = SAFETY_NOTE;
  for (let r = first; r <= lastRow; r++) {
    for (const letter of [c.price, c.p0, c.pk, c.p0Worth, c.pkWorth, c.toc, c.compliantToc]) ws.getCell(`${letter}${r}`).numFmt = '#,##0';
    ws.getCell(`${c.efficiency}${r}`).numFmt = '0.00%';
  }
  ws.getColumn('A').width = 44;
  for (let i = 2; i <= 10; i++) ws.getColumn(i).width = 16;
  return wb;
}
