/**
 * The demo scenario of DESIGN.md: "Fernhill Works", a fictional light-industrial campus with 14
 * pad-mounted units. Every name and number here is invented: ratings of 500–2500 kVA at 12,470 V
 * to 480 V or 208 V (Dyn1), losses of the order of today's efficient distribution units, and
 * ratio-test readings within a few tenths of a percent of nameplate, two of them outside ±0.5 %.
 * The workbooks use XFMR formulas only for what the add-in computes; the data are plain values.
 */
import ExcelJS from 'exceljs';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { SAFETY_NOTE } from '../cells/metadata';
import { turnsRatio } from '../core/ratio';
import { NORMAL_LIFE_HOURS } from '../core/thermal';

export interface FleetUnit {
  readonly id: string;
  readonly location: string;
  readonly kva: number;
  readonly hvV: number;
  readonly lvV: number;
  readonly vectorGroup: string;
  /** Test report: no-load loss and load loss at 85 °C, W; impedance as a fraction. */
  readonly p0W: number;
  readonly pkW: number;
  readonly z: number;
  /** How far the invented ratio-test reading lies from nameplate (fraction). */
  readonly ratioOffset: number;
}

const unit = (id: string, location: string, kva: number, lvV: number, p0W: number, pkW: number, z: number, ratioOffset: number): FleetUnit => ({
  id,
  location,
  kva,
  hvV: 12_470,
  lvV,
  vectorGroup: 'Dyn1',
  p0W,
  pkW,
  z,
  ratioOffset,
});

export const FLEET: readonly FleetUnit[] = [
  unit('FH-01', 'Assembly Hall A', 2000, 480, 1790, 14_200, 0.0575, 0.0011),
  unit('FH-02', 'Assembly Hall B', 2000, 480, 1840, 14_650, 0.0575, -0.0008),
  unit('FH-03', 'Press Shop', 2500, 480, 2160, 16_900, 0.0575, 0.0019),
  unit('FH-04', 'Paint Line', 1500, 480, 1470, 11_700, 0.0575, -0.0062),
  unit('FH-05', 'Tool Room', 750, 480, 870, 6_750, 0.0575, 0.0004),
  unit('FH-06', 'Compressor House', 1000, 480, 1060, 8_550, 0.0575, -0.0015),
  unit('FH-07', 'Boiler House', 1000, 480, 1420, 11_300, 0.0575, 0.0027),
  unit('FH-08', 'Warehouse North', 750, 480, 890, 6_900, 0.0575, 0.0009),
  unit('FH-09', 'Warehouse South', 750, 480, 845, 6_600, 0.0575, -0.0003),
  unit('FH-10', 'Dispatch Yard', 500, 480, 640, 5_150, 0.05, 0.0071),
  unit('FH-11', 'Test Laboratory', 1500, 480, 1430, 11_400, 0.0575, -0.0021),
  unit('FH-12', 'Canteen and Offices', 500, 208, 615, 5_050, 0.05, 0.0012),
  unit('FH-13', 'Data Room', 1000, 480, 1035, 8_400, 0.0575, 0.0006),
  unit('FH-14', 'Site Lighting', 500, 208, 660, 5_300, 0.05, -0.0035),
];

/** The unit whose year of hourly loading the second workbook models. */
export const YEAR_UNIT = FLEET[2]!;
export const YEAR_POWER_FACTOR = 0.92;
export const YEAR_SEED = 20_250_101;
/** A seed of its own, so the loads stay the same year whether or not the weather is drawn. */
export const AMBIENT_SEED = 20_250_102;
export const HOURS = 8760;
/** The cooling the year's thermal formulas name: a pad-mounted unit, oil natural, air natural. */
export const YEAR_COOLING = 'ONAN';
const YEAR_START = Date.UTC(2025, 0, 1); // a Wednesday

/** What a turns-ratio test set would show: three decimals. */
export function measuredRatio(u: FleetUnit): number {
  return Math.round(turnsRatio(u.hvV, u.lvV, u.vectorGroup) * (1 + u.ratioOffset) * 1000) / 1000;
}

/**
 * A year of hourly per-unit loads for a press shop: two shifts on weekdays (06–22 h), one on
 * Saturday morning, a base of compressors and lighting at night and on Sunday, a lunch dip, a
 * summer cooling bump, a two-week August shutdown and the Christmas week, plus ±3 % noise from a
 * seeded generator (pure-rand xoroshiro128+) so every run gives the same year.
 */
export function yearOfLoads(seed = YEAR_SEED): Float64Array {
  const rng = xoroshiro128plus(seed);
  const loads = new Float64Array(HOURS);
  for (let h = 0; h < HOURS; h++) {
    const t = new Date(YEAR_START + h * 3_600_000);
    const day = Math.floor(h / 24); // 0 = 1 January
    const hour = t.getUTCHours();
    const weekday = t.getUTCDay(); // 0 Sunday … 6 Saturday
    const shutdown = (day >= 215 && day < 229) || day >= 358; // 4–17 August, 25–31 December
    const base = 0.16;
    let work = 0;
    if (!shutdown && weekday >= 1 && weekday <= 5 && hour >= 6 && hour < 22) work = hour < 14 ? 0.62 : 0.55;
    if (!shutdown && weekday === 6 && hour >= 6 && hour < 14) work = 0.38;
    if (work > 0 && hour === 12) work -= 0.08; // lunch
    // Cooling in summer afternoons, heating and lighting in winter: peaks in July, low in April/October.
    const season = Math.cos((2 * Math.PI * (day - 196)) / 365);
    const climate = season > 0 ? 0.1 * season * (hour >= 11 && hour < 19 ? 1 : 0.4) : -0.04 * season;
    const noise = (uniformFloat64(rng) - 0.5) * 0.06;
    loads[h] = Math.round(Math.min(1.15, Math.max(0.05, base + work + climate + noise)) * 1000) / 1000;
  }
  return loads;
}

/**
 * A year of hourly air temperatures for a temperate inland campus, °C: a mean of 11 °C, seasons of
 * ±8.5 K peaking in late July, a daily swing of ±3 K in winter to ±5.5 K in summer with the warmest
 * hour at 15 h, and weather — spells a few days long — as a first-order autoregressive drift
 * (each hour keeps 99 % of the last hour's departure; about ±2.4 K standard deviation) plus ±0.3 K
 * noise, from a seeded generator (pure-rand xoroshiro128+). Invented: no real site's record. The
 * figures are of the kind a temperate climate has (common practice); the seeded year runs from
 * −4.6 to 28.4 °C with a mean of 10.4 °C.
 */
export function yearOfAmbients(seed = AMBIENT_SEED): Float64Array {
  const rng = xoroshiro128plus(seed);
  const ambients = new Float64Array(HOURS);
  let weather = 0;
  for (let h = 0; h < HOURS; h++) {
    const day = Math.floor(h / 24);
    const hour = h % 24;
    const season = Math.cos((2 * Math.PI * (day - 200)) / 365); // 1 on 20 July, −1 in mid January
    const swing = 4.25 + 1.25 * season;
    const daily = swing * Math.cos((2 * Math.PI * (hour - 15)) / 24);
    weather = 0.99 * weather + (uniformFloat64(rng) - 0.5) * 1.2;
    const noise = (uniformFloat64(rng) - 0.5) * 0.6;
    ambients[h] = Math.round((11 + 8.5 * season + daily + weather + noise) * 10) / 10;
  }
  return ambients;
}

export const hourStart = (h: number): Date => new Date(YEAR_START + h * 3_600_000);

export const INVENTED = 'Fernhill Works is fictional; every unit, reading, load and temperature here is invented demo data.';

function header(ws: ExcelJS.Worksheet, labels: readonly string[]): void {
  const row = ws.getRow(1);
  labels.forEach((label, i) => (row.getCell(i + 1).value = label));
  row.font = { bold: true };
}

/** Column letters of the fleet sheet, named once so formulas and readers agree. */
export const FLEET_COLUMNS = {
  id: 'A',
  location: 'B',
  kva: 'C',
  hv: 'D',
  lv: 'E',
  vectorGroup: 'F',
  p0: 'G',
  pk: 'H',
  z: 'I',
  measured: 'J',
  nameplateRatio: 'K',
  deviation: 'L',
  ratioOk: 'M',
  ratedCurrent: 'N',
  faultCurrent: 'O',
  eff50: 'P',
  peakLoad: 'Q',
  pei: 'R',
} as const;

export function fleetWorkbook(): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Fluxbook demo';
  wb.title = 'Fernhill Works fleet';
  const ws = wb.addWorksheet('Fleet');
  header(ws, [
    'Unit',
    'Location',
    'Rating (kVA)',
    'HV (V)',
    'LV (V)',
    'Vector group',
    'No-load loss (W)',
    'Load loss at 85 °C (W)',
    'Impedance',
    'Measured ratio',
    'Nameplate ratio',
    'Ratio deviation',
    'Ratio within ±0.5 %',
    'Rated LV current (A)',
    'LV fault current, infinite source (A)',
    'Efficiency at 50 % load',
    'Load of peak efficiency (per unit)',
    'Peak efficiency index',
  ]);
  const c = FLEET_COLUMNS;
  FLEET.forEach((u, i) => {
    const r = i + 2;
    const cell = (col: string) => ws.getCell(`${col}${r}`);
    cell(c.id).value = u.id;
    cell(c.location).value = u.location;
    cell(c.kva).value = u.kva;
    cell(c.hv).value = u.hvV;
    cell(c.lv).value = u.lvV;
    cell(c.vectorGroup).value = u.vectorGroup;
    cell(c.p0).value = u.p0W;
    cell(c.pk).value = u.pkW;
    cell(c.z).value = u.z;
    cell(c.measured).value = measuredRatio(u);
    const at = (col: string) => `${col}${r}`;
    cell(c.nameplateRatio).value = { formula: `XFMR.RATIO(${at(c.hv)},${at(c.lv)},${at(c.vectorGroup)})` };
    cell(c.deviation).value = { formula: `XFMR.RATIODEV(${at(c.measured)},${at(c.hv)},${at(c.lv)},${at(c.vectorGroup)})` };
    cell(c.ratioOk).value = { formula: `XFMR.RATIOOK(${at(c.measured)},${at(c.hv)},${at(c.lv)},${at(c.vectorGroup)})` };
    cell(c.ratedCurrent).value = { formula: `XFMR.IRATED(${at(c.kva)},${at(c.lv)})` };
    cell(c.faultCurrent).value = { formula: `XFMR.ISC(${at(c.kva)},${at(c.lv)},${at(c.z)})` };
    cell(c.eff50).value = { formula: `XFMR.EFF(${at(c.kva)},${at(c.p0)},${at(c.pk)},0.5)` };
    cell(c.peakLoad).value = { formula: `XFMR.EFFMAXLOAD(${at(c.p0)},${at(c.pk)})` };
    cell(c.pei).value = { formula: `XFMR.PEI(${at(c.kva)},${at(c.p0)},${at(c.pk)})` };
  });
  const formats: Record<string, string> = {
    [c.z]: '0.00%',
    [c.measured]: '0.000',
    [c.nameplateRatio]: '0.000',
    [c.deviation]: '0.00%',
    [c.ratedCurrent]: '#,##0',
    [c.faultCurrent]: '#,##0',
    [c.eff50]: '0.00%',
    [c.peakLoad]: '0.00',
    [c.pei]: '0.000%',
  };
  for (const [col, fmt] of Object.entries(formats)) ws.getColumn(col).numFmt = fmt;
  ws.columns.forEach((col) => (col.width = 16));
  ws.getCell(`A${FLEET.length + 3}`).value = INVENTED;
  ws.getCell(`A${FLEET.length + 4}`).value = SAFETY_NOTE;

  const curve = wb.addWorksheet('Curve');
  curve.getCell('A1').value = `Efficiency curve of ${YEAR_UNIT.id} ${YEAR_UNIT.location} at power factor ${YEAR_POWER_FACTOR}`;
  curve.getRow(2).values = ['Load (per unit)', 'Efficiency', 'Total losses (W)'];
  curve.getRow(2).font = { bold: true };
  const row = FLEET.indexOf(YEAR_UNIT) + 2;
  curve.getCell('A3').value = { formula: `XFMR.EFFCURVE(Fleet!C${row},Fleet!G${row},Fleet!H${row},${YEAR_POWER_FACTOR},11,1.25)` };
  curve.getColumn('B').numFmt = '0.00%';
  curve.getColumn('C').numFmt = '#,##0';
  curve.columns.forEach((col) => (col.width = 18));
  return wb;
}

/** Cells of the year workbook's summary, named once so formulas and readers agree. */
export const YEAR_CELLS = {
  energyLost: 'B8',
  energyOut: 'B9',
  allDay: 'B10',
  hottestAmbient: 'B17',
  peakHotSpot: 'B18',
  equivalentAging: 'B19',
  lifeUsed: 'B20',
  normalLife: 'B21',
  lifeFraction: 'B22',
  maxLoadHottest: 'B23',
} as const;

/** Columns of the year's profile sheet; the hot-spot column is one XFMR.HOTSPOTS spill from row 2. */
export const PROFILE_COLUMNS = { hour: 'A', load: 'B', ambient: 'C', hotSpot: 'D' } as const;

export function yearWorkbook(loads: Float64Array = yearOfLoads(), ambients: Float64Array = yearOfAmbients()): ExcelJS.Workbook {
  if (ambients.length !== loads.length) throw new Error(`yearWorkbook: ${loads.length} loads but ${ambients.length} ambients`);
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Fluxbook demo';
  wb.title = `Fernhill Works ${YEAR_UNIT.id}, a year of hourly loading`;
  const summary = wb.addWorksheet('Summary');
  const profile = wb.addWorksheet('Profile');
  header(profile, ['Hour starting (UTC)', 'Load (per unit)', 'Ambient (°C)', 'Hot-spot at the end of the hour (°C)']);
  for (let h = 0; h < loads.length; h++) {
    const r = profile.getRow(h + 2);
    r.getCell(1).value = hourStart(h);
    r.getCell(2).value = loads[h]!;
    r.getCell(3).value = ambients[h]!;
  }
  const p = PROFILE_COLUMNS;
  const last = loads.length + 1;
  const range = `Profile!${p.load}2:${p.load}${last}`;
  const ambientRange = `Profile!${p.ambient}2:${p.ambient}${last}`;
  const cooling = `"${YEAR_COOLING}"`;
  // One formula spills the whole column of hot-spots (8,760 rows), for a chart beside the loads.
  profile.getCell(`${p.hotSpot}2`).value = { formula: `XFMR.HOTSPOTS(${p.load}2:${p.load}${last},${p.ambient}2:${p.ambient}${last},1,${cooling})` };
  profile.getColumn(1).numFmt = 'yyyy-mm-dd hh:mm';
  profile.getColumn(1).width = 20;
  profile.getColumn(2).width = 16;
  profile.getColumn(3).width = 14;
  profile.getColumn(4).width = 22;
  profile.getColumn(4).numFmt = '0.0';

  const c = YEAR_CELLS;
  const rows: [string, ExcelJS.CellValue?, string?][] = [
    ['Unit', `${YEAR_UNIT.id} ${YEAR_UNIT.location}`],
    ['Rating (kVA)', YEAR_UNIT.kva],
    ['No-load loss (W)', YEAR_UNIT.p0W],
    ['Load loss at 85 °C (W)', YEAR_UNIT.pkW],
    ['Power factor', YEAR_POWER_FACTOR],
    ['Hours in the profile', { formula: `COUNT(${range})` }],
    [''],
    ['Energy lost in the year (kWh)', { formula: `XFMR.ELOSS(B3,B4,${range})` }, '#,##0'],
    ['Energy delivered (kWh)', { formula: `XFMR.EOUT(B2,${range},B5)` }, '#,##0'],
    ['All-day efficiency', { formula: `XFMR.ALLDAY(B2,B3,B4,${range},B5)` }, '0.00%'],
    ['Load factor', { formula: `XFMR.LOADFACTOR(${range})` }, '0.000'],
    ['Loss factor', { formula: `XFMR.LOSSFACTOR(${range})` }, '0.000'],
    ['Loss factor estimated from the load factor', { formula: 'XFMR.LSF(B11)' }, '0.000'],
    ['Peak load (per unit)', { formula: `MAX(${range})` }, '0.000'],
    ['Efficiency at the mean load', { formula: `XFMR.EFF(B2,B3,B4,AVERAGE(${range}),B5)` }, '0.00%'],
    [`Insulation aging, ${YEAR_COOLING} with the cooling table's thermal data, thermally upgraded paper`],
    ['Hottest ambient of the year (°C)', { formula: `MAX(${ambientRange})` }, '0.0'],
    ['Peak hot-spot of the year (°C)', { formula: `MAX(Profile!${p.hotSpot}2:${p.hotSpot}${last})` }, '0.0'],
    ['Equivalent aging factor F_EQA', { formula: `XFMR.FEQA(${range},${ambientRange},1,${cooling})` }, '0.0000'],
    ['Life used in the year (h of normal aging)', { formula: `XFMR.LIFEUSED(${range},${ambientRange},1,${cooling})` }, '#,##0.0'],
    ['Normal insulation life (h)', NORMAL_LIFE_HOURS, '#,##0'],
    ['Fraction of the normal life used', { formula: `${c.lifeUsed}/${c.normalLife}` }, '0.000%'],
    ['Largest steady load at the hottest ambient, 110 °C hot-spot (per unit)', { formula: `XFMR.MAXLOAD(${c.hottestAmbient},110,${cooling})` }, '0.000'],
    [''],
    [INVENTED],
    [SAFETY_NOTE],
  ];
  rows.forEach(([label, value, fmt], i) => {
    summary.getCell(`A${i + 1}`).value = label;
    if (value !== undefined) summary.getCell(`B${i + 1}`).value = value;
    if (fmt) summary.getCell(`B${i + 1}`).numFmt = fmt;
  });
  summary.getColumn('A').width = 42;
  summary.getColumn('B').width = 20;
  return wb;
}
