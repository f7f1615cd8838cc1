/**
 * The third Fernhill Works workbook: three fictional offers for one 1000 kVA three-phase
 * liquid-immersed unit compared by total owning cost, with the US DOE 2016 efficiency check of each.
 * Every offer, price and loss is invented; the offers are named by letter only so no name can
 * resemble a real firm. The story the figures tell: the cheapest offer to buy is the dearest to own
 * and misses the DOE minimum; of the two that pass, the lower losses of the dearest-to-buy one
 * nearly, but not quite, pay back its price.
 */
import ExcelJS from 'exceljs';
import { SAFETY_NOTE } from '../cells/metadata';

export interface Offer {
  readonly name: string;
  readonly price: number;
  /** No-load loss at 20 °C and load loss at 55 °C (the DOE test method's reference temperatures), W. */
  readonly p0W: number;
  readonly pkW: number;
}

export const OFFERS: readonly Offer[] = [
  { name: 'Offer A', price: 21_800, p0W: 690, pkW: 7_500 },
  { name: 'Offer B', price: 18_900, p0W: 980, pkW: 9_800 },
  { name: 'Offer C', price: 25_400, p0W: 450, pkW: 7_400 },
];

/** The buyer's evaluation policy (invented): what a watt of loss is worth over the unit's life. */
export const EVALUATION = {
  kva: 1000,
  priceKwh: 0.12,
  rate: 0.06,
  years: 25,
  lossFactor: 0.35,
  peakLoad: 0.8,
} as const;

/** Cells of the bid sheet, named once so formulas, readers and tests agree. */
export const BID_CELLS = {
  kva: 'B4',
  priceKwh: 'B5',
  rate: 'B6',
  years: 'B7',
  lossFactor: 'B8',
  peakLoad: 'B9',
  aFactor: 'B10',
  bFactor: 'B11',
  doeMinimum: 'B12',
  lowestCompliantToc: 'B19',
  recommended: 'B20',
  cheapestToBuy: 'B21',
} as const;

/** Columns of the offers table, whose first offer is on OFFER_ROW. */
export const OFFER_COLUMNS = {
  name: 'A',
  price: 'B',
  p0: 'C',
  pk: 'D',
  efficiency: 'E',
  complies: 'F',
  p0Worth: 'G',
  pkWorth: 'H',
  toc: 'I',
  compliantToc: 'J',
} as const;
export const OFFER_ROW = 15;

const BIDS_INVENTED = 'Fernhill Works and these offers are fictional; every price and loss here is invented demo data.';

export function bidWorkbook(offers: readonly Offer[] = OFFERS): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Fluxbook demo';
  wb.title = 'Fernhill Works bids by total owning cost';
  const ws = wb.addWorksheet('Bids');
  const e = EVALUATION;
  const b = BID_CELLS;
  const abs = (cell: string) => cell.replace(/^([A-Z]+)(\d+)$/, '$$$1$$$2');
  ws.getCell('A1').value = `Fernhill Works: offers for one ${e.kva} kVA three-phase liquid-immersed unit, compared by total owning cost`;
  ws.getCell('A1').font = { bold: true };
  ws.getCell('A3').value = 'Evaluation inputs';
  ws.getCell('A3').font = { bold: true };
  const inputs: [string, string, ExcelJS.CellValue, string?][] = [
    [b.kva, 'Rating (kVA)', e.kva],
    [b.priceKwh, 'Energy price (per kWh)', e.priceKwh, '0.000'],
    [b.rate, 'Interest rate a year', e.rate, '0.0%'],
    [b.years, 'Evaluation period (years)', e.years],
    [b.lossFactor, 'Loss factor of the loading', e.lossFactor, '0.00'],
    [b.peakLoad, 'Peak load (per unit)', e.peakLoad, '0.00'],
    [b.aFactor, 'A factor: worth of 1 W of no-load loss', { formula: `XFMR.AFACTOR(${b.priceKwh},${b.rate},${b.years})` }, '#,##0.00'],
    [b.bFactor, 'B factor: worth of 1 W of load loss', { formula: `XFMR.BFACTOR(${b.priceKwh},${b.lossFactor},${b.peakLoad},${b.rate},${b.years})` }, '#,##0.00'],
    [b.doeMinimum, 'US DOE 2016 minimum efficiency at 50 % load', { formula: `XFMR.DOEMIN(${b.kva},"liquid",3,2016)` }, '0.00%'],
  ];
  for (const [cell, label, value, fmt] of inputs) {
    ws.getCell(cell.replace(/^B/, 'A')).value = label;
    ws.getCell(cell).value = value;
    if (fmt) ws.getCell(cell).numFmt = fmt;
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
    ws.getCell(at(c.efficiency)).value = { formula: `XFMR.EFF(${abs(b.kva)},${at(c.p0)},${at(c.pk)},0.5)` };
    ws.getCell(at(c.complies)).value = { formula: `XFMR.COMPLIES(${abs(b.kva)},${at(c.p0)},${at(c.pk)},"DOE","liquid",3,2016)` };
    ws.getCell(at(c.p0Worth)).value = { formula: `${abs(b.aFactor)}*${at(c.p0)}` };
    ws.getCell(at(c.pkWorth)).value = { formula: `${abs(b.bFactor)}*${at(c.pk)}` };
    ws.getCell(at(c.toc)).value = { formula: `XFMR.TOC(${at(c.price)},${at(c.p0)},${at(c.pk)},${abs(b.aFactor)},${abs(b.bFactor)})` };
    // Text for a failing offer, which MIN leaves out of a range.
    ws.getCell(at(c.compliantToc)).value = { formula: `IF(${at(c.complies)},${at(c.toc)},"fails DOE 2016")` };
  });
  const first = OFFER_ROW;
  const lastRow = OFFER_ROW + offers.length - 1;
  const col = (letter: string) => `${letter}${first}:${letter}${lastRow}`;
  const verdicts: [string, string, string, string?][] = [
    [b.lowestCompliantToc, 'Lowest total owning cost among compliant offers', `MIN(${col(c.compliantToc)})`, '#,##0'],
    [b.recommended, 'Recommended offer', `INDEX(${col(c.name)},MATCH(${b.lowestCompliantToc},${col(c.compliantToc)},0))`],
    [b.cheapestToBuy, 'Cheapest to buy', `INDEX(${col(c.name)},MATCH(MIN(${col(c.price)}),${col(c.price)},0))`],
  ];
  for (const [cell, label, formula, fmt] of verdicts) {
    ws.getCell(cell.replace(/^B/, 'A')).value = label;
    ws.getCell(cell).value = { formula };
    if (fmt) ws.getCell(cell).numFmt = fmt;
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
