/**
 * The year workbook: a year of hourly loads and ambients of one unit on the profile sheet, its
 * hot-spot and top oil of every hour as XFMR.HOTSPOTS and XFMR.TOPOILS spills beside them, and a
 * summary computed by XFMR formulas over the profile: energy and losses, insulation aging, and
 * whether the unit can carry its load — the LOADCHECK report for IEEE normal loading, CYCLICMAX
 * for the year, and how long it carries 1.3 per unit after the peak of its hottest day. Every
 * thermal formula reads the unit's own heat-run data (rises from its invented test report, R from
 * its P0 and Pk) from one XFMR.HEATRUN block.
 */
import type ExcelJS from 'exceljs';
import { BEYOND_NAMEPLATE } from '../cells/functions/thermalArguments';
import { SAFETY_NOTE } from '../cells/metadata';
import { loadingYear, NORMAL_LIFE_HOURS } from '../core/thermal';
import { hourStart, yearOfAmbients, yearOfLoads } from './generators';
import { cellsOf, columnsOf } from './layout';
import { INVENTED, YEAR_COOLING, YEAR_HEAT_RUN, YEAR_POWER_FACTOR, YEAR_UNIT } from './scenario';
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
  'topOilRise',
  'hsGradient',
  'lossRatio',
  'hottestAmbient',
  'peakTopOil',
  'peakHotSpot',
  'equivalentAging',
  'lifeUsed',
  'normalLife',
  'lifeFraction',
  'maxLoadHottest',
  'gap2',
  'loadingHeading',
  'loadOk',
  'cyclicMax',
  'cyclicPeakKva',
  'hottestDay',
  'hottestDayPeak',
  'hottestDayAmbient',
  'overload120',
  'settlesAt13',
  'gap3',
  'caution',
  'invented',
  'safety',
] as const;
type SummaryRow = (typeof SUMMARY_ROWS)[number];

/** Cells of the summary's values, so formulas and readers agree. */
export const YEAR_CELLS = cellsOf('B', SUMMARY_ROWS);
const LABELS = cellsOf('A', SUMMARY_ROWS);

/** Columns of the year's profile sheet; hot-spot and top oil are XFMR.HOTSPOTS and XFMR.TOPOILS spills from row 2. */
export const PROFILE_COLUMNS = columnsOf(['hour', 'load', 'ambient', 'hotSpot', 'topOil']);

/** Where the summary's two spills sit: the heat-run block and the LOADCHECK report, with their headings. */
export const YEAR_BLOCKS = {
  heatRunTitle: 'D1',
  heatRun: 'D2',
  heatRunRange: 'D2:E15',
  checkTitle: 'D17',
  check: 'D18',
  checkRange: 'D18:E31',
} as const;

/** The unit's thermal data as the heat-run block holds it: its report's rises, R from its P0 and Pk. */
export const YEAR_THERMAL_DATA = {
  topOilRise: YEAR_HEAT_RUN.topOilRise,
  hotSpotGradient: YEAR_HEAT_RUN.hotSpotGradient,
  lossRatio: YEAR_UNIT.pkW / YEAR_UNIT.p0W,
} as const;

/** The unit's hottest day: the day of its peak hot-spot of the year (0 = 1 January). */
export function hottestDay(loads: Float64Array, ambients: Float64Array): number {
  const hot = loadingYear(loads, ambients, { cooling: YEAR_COOLING, data: YEAR_THERMAL_DATA }).hotSpots;
  let at = 0;
  for (let h = 1; h < hot.length; h++) if (hot[h]! > hot[at]!) at = h;
  return Math.floor(at / 24);
}

export function yearWorkbook(loads: Float64Array = yearOfLoads(), ambients: Float64Array = yearOfAmbients()): ExcelJS.Workbook {
  if (ambients.length !== loads.length) throw new Error(`yearWorkbook: ${loads.length} loads but ${ambients.length} ambients`);
  const wb = demoWorkbook(`Fernhill Works ${YEAR_UNIT.id}, a year of hourly loading`);
  const summary = wb.addWorksheet('Summary');
  const profile = wb.addWorksheet('Profile');
  const p = PROFILE_COLUMNS;
  header(profile, ['Hour starting (UTC)', 'Load (per unit)', 'Ambient (°C)', 'Hot-spot at the end of the hour (°C)', 'Top oil at the end of the hour (°C)']);
  for (let h = 0; h < loads.length; h++) {
    const r = h + 2;
    profile.getCell(`${p.hour}${r}`).value = hourStart(h);
    profile.getCell(`${p.load}${r}`).value = loads[h]!;
    profile.getCell(`${p.ambient}${r}`).value = ambients[h]!;
  }
  const last = loads.length + 1;
  const range = `Profile!${p.load}2:${p.load}${last}`;
  const ambientRange = `Profile!${p.ambient}2:${p.ambient}${last}`;
  // The unit's thermal data, typed once: every thermal formula takes this block as its cooling.
  const unit = `Summary!${YEAR_BLOCKS.heatRunRange.replace(/([A-Z]+)(\d+)/g, '$$$1$$$2')}`;
  // One formula spills the whole column of hot-spots (8,760 rows), another the top oil, for a chart beside the loads.
  profile.getCell(`${p.hotSpot}2`).value = { formula: `XFMR.HOTSPOTS(${p.load}2:${p.load}${last},${p.ambient}2:${p.ambient}${last},1,${unit})` };
  profile.getCell(`${p.topOil}2`).value = { formula: `XFMR.TOPOILS(${p.load}2:${p.load}${last},${p.ambient}2:${p.ambient}${last},1,${unit})` };
  profile.getColumn(p.hour).numFmt = 'yyyy-mm-dd hh:mm';
  profile.getColumn(p.hour).width = 20;
  profile.getColumn(p.load).width = 16;
  profile.getColumn(p.ambient).width = 14;
  profile.getColumn(p.hotSpot).width = 22;
  profile.getColumn(p.hotSpot).numFmt = '0.0';
  profile.getColumn(p.topOil).width = 22;
  profile.getColumn(p.topOil).numFmt = '0.0';
  const day = hottestDay(loads, ambients);
  const dayRange = (col: string) => `Profile!${col}${day * 24 + 2}:${col}${day * 24 + 25}`;
  const profileArgs = `${range},${ambientRange},1,"normal","distribution",${unit}`;

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
    agingHeading: [`Insulation aging, ${YEAR_COOLING}, ${YEAR_UNIT.id}'s own thermal data (block in ${YEAR_BLOCKS.heatRunRange}), thermally upgraded paper`],
    topOilRise: ['Top-oil rise at rated load, heat-run report (K)', YEAR_HEAT_RUN.topOilRise, '0.0'],
    hsGradient: ['Hot-spot gradient at rated load, heat-run report (K)', YEAR_HEAT_RUN.hotSpotGradient, '0.0'],
    lossRatio: ['Loss ratio R = load loss ÷ no-load loss', { formula: `${c.pk}/${c.p0}` }, '0.00'],
    hottestAmbient: ['Hottest ambient of the year (°C)', { formula: `MAX(${ambientRange})` }, '0.0'],
    peakTopOil: ['Peak top oil of the year (°C)', { formula: `MAX(Profile!${p.topOil}2:${p.topOil}${last})` }, '0.0'],
    peakHotSpot: ['Peak hot-spot of the year (°C)', { formula: `MAX(Profile!${p.hotSpot}2:${p.hotSpot}${last})` }, '0.0'],
    equivalentAging: ['Equivalent aging factor F_EQA', { formula: `XFMR.FEQA(${range},${ambientRange},1,${unit})` }, '0.0000'],
    lifeUsed: ['Life used in the year (h of normal aging)', { formula: `XFMR.LIFEUSED(${range},${ambientRange},1,${unit})` }, '#,##0.0'],
    normalLife: ['Normal insulation life (h)', NORMAL_LIFE_HOURS, '#,##0'],
    lifeFraction: ['Fraction of the normal life used', { formula: `${c.lifeUsed}/${c.normalLife}` }, '0.000%'],
    maxLoadHottest: ['Largest steady load at the hottest ambient, 110 °C hot-spot (per unit)', { formula: `XFMR.MAXLOAD(${c.hottestAmbient},110,${unit})` }, '0.000'],
    gap2: [''],
    loadingHeading: [`Can it carry the load? IEEE C57.91 normal life expectancy loading (report in ${YEAR_BLOCKS.checkRange})`],
    loadOk: ['The year within normal loading (XFMR.LOADOK)', { formula: `XFMR.LOADOK(${profileArgs})` }],
    cyclicMax: ['Largest factor on the whole year still within it (XFMR.CYCLICMAX)', { formula: `XFMR.CYCLICMAX(${profileArgs})` }, '0.000'],
    cyclicPeakKva: ['Its peak load at that factor (kVA)', { formula: `${c.cyclicMax}*${c.peakLoad}*${c.kva}` }, '#,##0'],
    hottestDay: ["Hottest day (the day of the year's peak hot-spot)", hourStart(day * 24), 'yyyy-mm-dd'],
    hottestDayPeak: ['Peak load of the hottest day (per unit)', { formula: `MAX(${dayRange(p.load)})` }, '0.000'],
    hottestDayAmbient: ['Hottest ambient of that day (°C)', { formula: `MAX(${dayRange(p.ambient)})` }, '0.0'],
    overload120: ['Hours it carries 1.3 per unit after that peak until the hot-spot reaches 120 °C', { formula: `XFMR.OVERLOADTIME(${c.hottestDayPeak},1.3,${c.hottestDayAmbient},120,${unit})` }, '0.00'],
    settlesAt13: ['Hot-spot 1.3 per unit settles at, left on at that ambient (°C)', { formula: `XFMR.HOTSPOT(1.3,${c.hottestDayAmbient},${unit})` }, '0.0'],
    gap3: [''],
    caution: [BEYOND_NAMEPLATE],
    invented: [INVENTED],
    safety: [SAFETY_NOTE],
  };
  for (const key of SUMMARY_ROWS) {
    const [label, value, fmt] = rows[key];
    summary.getCell(LABELS[key]).value = label;
    if (value !== undefined) summary.getCell(c[key]).value = value;
    if (fmt) summary.getCell(c[key]).numFmt = fmt;
  }
  const b = YEAR_BLOCKS;
  summary.getCell(b.heatRunTitle).value = `${YEAR_UNIT.id} thermal data (XFMR.HEATRUN)`;
  summary.getCell(b.heatRun).value = { formula: `XFMR.HEATRUN("${YEAR_COOLING}","IEEE",${c.topOilRise},${c.hsGradient},"",${c.lossRatio})` };
  summary.getCell(b.checkTitle).value = `${YEAR_UNIT.id} over the year, IEEE normal loading (XFMR.LOADCHECK)`;
  summary.getCell(b.check).value = { formula: `XFMR.LOADCHECK(${profileArgs})` };
  summary.getColumn('A').width = 42;
  summary.getColumn('B').width = 20;
  summary.getColumn('D').width = 36;
  summary.getColumn('E').width = 22;
  return wb;
}
