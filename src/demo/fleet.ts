/**
 * The fleet workbook: one row per Fernhill Works unit with its nameplate and test-report data as
 * plain values and XFMR formulas for what the add-in computes, and the efficiency curve of the
 * unit whose year the year workbook models.
 */
import type ExcelJS from 'exceljs';
import { SAFETY_NOTE } from '../cells/metadata';
import { columnsOf } from './layout';
import { FLEET, INVENTED, measuredRatio, YEAR_POWER_FACTOR, YEAR_UNIT } from './scenario';
import { demoWorkbook, header } from './sheet';

/** The fleet sheet's columns in order, each with its heading. */
const FLEET_SHEET = [
  ['id', 'Unit'],
  ['location', 'Location'],
  ['kva', 'Rating (kVA)'],
  ['hv', 'HV (V)'],
  ['lv', 'LV (V)'],
  ['vectorGroup', 'Vector group'],
  ['p0', 'No-load loss (W)'],
  ['pk', 'Load loss at 85 °C (W)'],
  ['z', 'Impedance'],
  ['measured', 'Measured ratio'],
  ['nameplateRatio', 'Nameplate ratio'],
  ['deviation', 'Ratio deviation'],
  ['ratioOk', 'Ratio within ±0.5 %'],
  ['ratedCurrent', 'Rated LV current (A)'],
  ['faultCurrent', 'LV fault current, infinite source (A)'],
  ['eff50', 'Efficiency at 50 % load'],
  ['peakLoad', 'Load of peak efficiency (per unit)'],
  ['pei', 'Peak efficiency index'],
  ['p0Guaranteed', 'Guaranteed no-load loss (W)'],
  ['pkGuaranteed', 'Guaranteed load loss at 85 °C (W)'],
  ['zGuaranteed', 'Guaranteed impedance'],
  ['p0Accepted', 'No-load loss within +15 %'],
  ['pkAccepted', 'Load loss within +15 %'],
  ['totalLimit', 'Highest accepted total loss (W)'],
  ['totalAccepted', 'Total loss within +10 %'],
  ['zAccepted', 'Impedance within ±10 %'],
  ['ratioAccepted', 'Ratio within IEC tolerance'],
] as const;

/**
 * The acceptance check of each test report against its guarantee (IEC 60076-1 Table 1): one
 * formula per column, written in the first unit's row, whose ranges cover the whole fleet so the
 * result spills down the column. A component loss passes on its own +15 % only with the total
 * within +10 % as well, which is why the total has a column of its own.
 */
function acceptanceFormulas(c: typeof FLEET_COLUMNS, first: number, last: number): Partial<Record<keyof typeof FLEET_COLUMNS, string>> {
  const col = (k: string) => `${k}${first}:${k}${last}`;
  const measuredTotal = `${col(c.p0)}+${col(c.pk)}`;
  const guaranteedTotal = `${col(c.p0Guaranteed)}+${col(c.pkGuaranteed)}`;
  return {
    p0Accepted: `XFMR.TESTOK(${col(c.p0)},${col(c.p0Guaranteed)},"no-load loss")`,
    pkAccepted: `XFMR.TESTOK(${col(c.pk)},${col(c.pkGuaranteed)},"load loss")`,
    totalLimit: `XFMR.TESTTOL("total loss",${guaranteedTotal})`,
    totalAccepted: `XFMR.TESTOK(${measuredTotal},${guaranteedTotal},"total loss")`,
    zAccepted: `XFMR.TESTOK(${col(c.z)},${col(c.zGuaranteed)},"impedance")`,
    ratioAccepted: `XFMR.TESTOK(${col(c.measured)},${col(c.nameplateRatio)},"ratio","IEC",${col(c.z)})`,
  };
}

/** Column letters of the fleet sheet, so formulas and readers agree. */
export const FLEET_COLUMNS = columnsOf(FLEET_SHEET.map(([key]) => key));

/** The sheet row of a fleet unit (row 1 holds the headings). */
export const fleetRow = (index: number): number => index + 2;

export function fleetWorkbook(): ExcelJS.Workbook {
  const wb = demoWorkbook('Fernhill Works fleet');
  const ws = wb.addWorksheet('Fleet');
  header(
    ws,
    FLEET_SHEET.map(([, label]) => label),
  );
  const c = FLEET_COLUMNS;
  FLEET.forEach((u, i) => {
    const r = fleetRow(i);
    const at = (col: string) => `${col}${r}`;
    const cell = (col: string) => ws.getCell(at(col));
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
    cell(c.nameplateRatio).value = { formula: `XFMR.RATIO(${at(c.hv)},${at(c.lv)},${at(c.vectorGroup)})` };
    cell(c.deviation).value = { formula: `XFMR.RATIODEV(${at(c.measured)},${at(c.hv)},${at(c.lv)},${at(c.vectorGroup)})` };
    cell(c.ratioOk).value = { formula: `XFMR.RATIOOK(${at(c.measured)},${at(c.hv)},${at(c.lv)},${at(c.vectorGroup)})` };
    cell(c.ratedCurrent).value = { formula: `XFMR.IRATED(${at(c.kva)},${at(c.lv)})` };
    cell(c.faultCurrent).value = { formula: `XFMR.ISC(${at(c.kva)},${at(c.lv)},${at(c.z)})` };
    cell(c.eff50).value = { formula: `XFMR.EFF(${at(c.kva)},${at(c.p0)},${at(c.pk)},0.5)` };
    cell(c.peakLoad).value = { formula: `XFMR.EFFMAXLOAD(${at(c.p0)},${at(c.pk)})` };
    cell(c.pei).value = { formula: `XFMR.PEI(${at(c.kva)},${at(c.p0)},${at(c.pk)})` };
    cell(c.p0Guaranteed).value = u.guaranteed.p0W;
    cell(c.pkGuaranteed).value = u.guaranteed.pkW;
    cell(c.zGuaranteed).value = u.guaranteed.z;
  });
  const first = fleetRow(0);
  for (const [key, formula] of Object.entries(acceptanceFormulas(c, first, fleetRow(FLEET.length - 1)))) {
    ws.getCell(`${c[key as keyof typeof c]}${first}`).value = { formula: formula! };
  }
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
    [c.zGuaranteed]: '0.00%',
    [c.totalLimit]: '#,##0',
  };
  for (const [col, fmt] of Object.entries(formats)) ws.getColumn(col).numFmt = fmt;
  ws.columns.forEach((col) => (col.width = 16));
  ws.getCell(`${c.id}${FLEET.length + 3}`).value = INVENTED;
  ws.getCell(`${c.id}${FLEET.length + 4}`).value = SAFETY_NOTE;

  // The curve sheet: a title, the headings, then one XFMR.EFFCURVE spill from its first column.
  const curve = wb.addWorksheet('Curve');
  const k = columnsOf(['load', 'efficiency', 'losses']);
  curve.getCell(`${k.load}1`).value = `Efficiency curve of ${YEAR_UNIT.id} ${YEAR_UNIT.location} at power factor ${YEAR_POWER_FACTOR}`;
  curve.getRow(2).values = ['Load (per unit)', 'Efficiency', 'Total losses (W)'];
  curve.getRow(2).font = { bold: true };
  const row = fleetRow(FLEET.indexOf(YEAR_UNIT));
  const fleet = (col: string) => `Fleet!${col}${row}`;
  curve.getCell(`${k.load}3`).value = { formula: `XFMR.EFFCURVE(${fleet(c.kva)},${fleet(c.p0)},${fleet(c.pk)},${YEAR_POWER_FACTOR},11,1.25)` };
  curve.getColumn(k.efficiency).numFmt = '0.00%';
  curve.getColumn(k.losses).numFmt = '#,##0';
  curve.columns.forEach((col) => (col.width = 18));
  return wb;
}
