/**
 * The year workbook: a year of hourly loads and ambients of one unit on the profile sheet, the
 * hot-spot of every hour as one XFMR.HOTSPOTS spill beside them, and a summary of energy, losses
 * and insulation aging computed by XFMR formulas over the profile.
 */
import type ExcelJS from 'exceljs';
import { SAFETY_NOTE } from '../cells/metadata';
import { NORMAL_LIFE_HOURS } from '../core/thermal';
import { hourStart, yearOfAmbients, yearOfLoads } from './generators';
import { cellsOf, columnsOf } from './layout';
import { INVENTED, YEAR_COOLING, YEAR_POWER_FACTOR, YEAR_UNIT } from './scenario';
import { demoWorkbook, header } from './sheet';

/** The summary sheet's rows in order from row 1: labels in column A, values in column B. */
const SUMMARY_ROWS = [
  'unit',
  'kva',
  'p0',
  'pk',
  'pf',
  'hours',
  'gap1',
  'energyLost',
  'energyOut',
  'allDay',
  'loadFactor',
  'lossFactor',
  'lossFactorEstimate',
  'peakLoad',
  'meanLoadEfficiency',
  'agingHeading',
  'hottestAmbient',
  'peakHotSpot',
  'equivalentAging',
  'lifeUsed',
  'normalLife',
  'lifeFraction',
  'maxLoadHottest',
  'gap2',
  'invented',
  'safety',
] as const;
type SummaryRow = (typeof SUMMARY_ROWS)[number];

/** Cells of the summary's values, so formulas and readers agree. */
export const YEAR_CELLS = cellsOf('B', SUMMARY_ROWS);
const LABELS = cellsOf('A', SUMMARY_ROWS);

/** Columns of the year's profile sheet; the hot-spot column is one XFMR.HOTSPOTS spill from row 2. */
export const PROFILE_COLUMNS = columnsOf(['hour', 'load', 'ambient', 'hotSpot']);

export function yearWorkbook(loads: Float64Array = yearOfLoads(), ambients: Float64Array = yearOfAmbients()): ExcelJS.Workbook {
  if (ambients.length !== loads.length) throw new Error(`yearWorkbook: ${loads.length} loads but ${ambients.length} ambients`);
  const wb = demoWorkbook(`Fernhill Works ${YEAR_UNIT.id}, a year of hourly loading`);
  const summary = wb.addWorksheet('Summary');
  const profile = wb.addWorksheet('Profile');
  const p = PROFILE_COLUMNS;
  header(profile, ['Hour starting (UTC)', 'Load (per unit)', 'Ambient (°C)', 'Hot-spot at the end of the hour (°C)']);
  for (let h = 0; h < loads.length; h++) {
    const r = h + 2;
    profile.getCell(`${p.hour}${r}`).value = hourStart(h);
    profile.getCell(`${p.load}${r}`).value = loads[h]!;
    profile.getCell(`${p.ambient}${r}`).value = ambients[h]!;
  }
  const last = loads.length + 1;
  const range = `Profile!${p.load}2:${p.load}${last}`;
  const ambientRange = `Profile!${p.ambient}2:${p.ambient}${last}`;
  const cooling = `"${YEAR_COOLING}"`;
  // One formula spills the whole column of hot-spots (8,760 rows), for a chart beside the loads.
  profile.getCell(`${p.hotSpot}2`).value = { formula: `XFMR.HOTSPOTS(${p.load}2:${p.load}${last},${p.ambient}2:${p.ambient}${last},1,${cooling})` };
  profile.getColumn(p.hour).numFmt = 'yyyy-mm-dd hh:mm';
  profile.getColumn(p.hour).width = 20;
  profile.getColumn(p.load).width = 16;
  profile.getColumn(p.ambient).width = 14;
  profile.getColumn(p.hotSpot).width = 22;
  profile.getColumn(p.hotSpot).numFmt = '0.0';

  const c = YEAR_CELLS;
  const rows: Record<SummaryRow, [string, ExcelJS.CellValue?, string?]> = {
    unit: ['Unit', `${YEAR_UNIT.id} ${YEAR_UNIT.location}`],
    kva: ['Rating (kVA)', YEAR_UNIT.kva],
    p0: ['No-load loss (W)', YEAR_UNIT.p0W],
    pk: ['Load loss at 85 °C (W)', YEAR_UNIT.pkW],
    pf: ['Power factor', YEAR_POWER_FACTOR],
    hours: ['Hours in the profile', { formula: `COUNT(${range})` }],
    gap1: [''],
    energyLost: ['Energy lost in the year (kWh)', { formula: `XFMR.ELOSS(${c.p0},${c.pk},${range})` }, '#,##0'],
    energyOut: ['Energy delivered (kWh)', { formula: `XFMR.EOUT(${c.kva},${range},${c.pf})` }, '#,##0'],
    allDay: ['All-day efficiency', { formula: `XFMR.ALLDAY(${c.kva},${c.p0},${c.pk},${range},${c.pf})` }, '0.00%'],
    loadFactor: ['Load factor', { formula: `XFMR.LOADFACTOR(${range})` }, '0.000'],
    lossFactor: ['Loss factor', { formula: `XFMR.LOSSFACTOR(${range})` }, '0.000'],
    lossFactorEstimate: ['Loss factor estimated from the load factor', { formula: `XFMR.LSF(${c.loadFactor})` }, '0.000'],
    peakLoad: ['Peak load (per unit)', { formula: `MAX(${range})` }, '0.000'],
    meanLoadEfficiency: ['Efficiency at the mean load', { formula: `XFMR.EFF(${c.kva},${c.p0},${c.pk},AVERAGE(${range}),${c.pf})` }, '0.00%'],
    agingHeading: [`Insulation aging, ${YEAR_COOLING} with the cooling table's thermal data, thermally upgraded paper`],
    hottestAmbient: ['Hottest ambient of the year (°C)', { formula: `MAX(${ambientRange})` }, '0.0'],
    peakHotSpot: ['Peak hot-spot of the year (°C)', { formula: `MAX(Profile!${p.hotSpot}2:${p.hotSpot}${last})` }, '0.0'],
    equivalentAging: ['Equivalent aging factor F_EQA', { formula: `XFMR.FEQA(${range},${ambientRange},1,${cooling})` }, '0.0000'],
    lifeUsed: ['Life used in the year (h of normal aging)', { formula: `XFMR.LIFEUSED(${range},${ambientRange},1,${cooling})` }, '#,##0.0'],
    normalLife: ['Normal insulation life (h)', NORMAL_LIFE_HOURS, '#,##0'],
    lifeFraction: ['Fraction of the normal life used', { formula: `${c.lifeUsed}/${c.normalLife}` }, '0.000%'],
    maxLoadHottest: ['Largest steady load at the hottest ambient, 110 °C hot-spot (per unit)', { formula: `XFMR.MAXLOAD(${c.hottestAmbient},110,${cooling})` }, '0.000'],
    gap2: [''],
    invented: [INVENTED],
    safety: [SAFETY_NOTE],
  };
  for (const key of SUMMARY_ROWS) {
    const [label, value, fmt] = rows[key];
    summary.getCell(LABELS[key]).value = label;
    if (value !== undefined) summary.getCell(c[key]).value = value;
    if (fmt) summary.getCell(c[key]).numFmt = fmt;
  }
  summary.getColumn('A').width = 42;
  summary.getColumn('B').width = 20;
  return wb;
}
