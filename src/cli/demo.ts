/** `fluxbook demo [--out DIR]`: writes the Fernhill Works workbooks, recalculated, and sums them up. */
import { promises as fs } from 'node:fs';
import { join } from 'node:path';
import { SAFETY_NOTE } from '../cells/metadata';
import type ExcelJS from 'exceljs';
import { calculateWorkbook, type Calculated, type FormulaResult, type JsonValue } from '../engine/xlsx';
import {
  BID_CELLS,
  bidWorkbook,
  EVALUATION,
  FLEET,
  FLEET_COLUMNS,
  fleetRow,
  fleetWorkbook,
  OFFER_COLUMNS,
  OFFER_ROW,
  OFFERS,
  YEAR_CELLS,
  YEAR_COOLING,
  YEAR_UNIT,
  yearWorkbook,
} from '../demo';
import { checkOutput, writeAtomically } from './files';

export const FLEET_FILE = 'fernhill-fleet.xlsx';
export const YEAR_FILE = 'fernhill-year.xlsx';
export const BIDS_FILE = 'fernhill-bids.xlsx';

export interface DemoOptions {
  readonly out: string;
  readonly overwrite?: boolean;
}

export interface DemoSummary {
  readonly files: string[];
  readonly ratioFailures: { id: string; location: string; deviation: number }[];
  readonly worstEfficiency: { id: string; location: string; efficiency: number };
  readonly energyLostKwh: number;
  readonly allDayEfficiency: number;
  readonly year: {
    readonly peakHotSpotC: number;
    readonly equivalentAging: number;
    readonly lifeUsedHours: number;
    readonly lifeFraction: number;
  };
  readonly bids: {
    readonly offers: { name: string; price: number; toc: number; complies: boolean }[];
    readonly recommended: string;
    readonly lowestCompliantToc: number;
  };
  readonly errors: number;
}

function numberAt(results: FormulaResult[], sheet: string, cell: string): number {
  const r = results.find((x) => x.sheet === sheet && x.cell === cell);
  const v: JsonValue | undefined = r?.value;
  if (typeof v !== 'number') throw new Error(`demo: ${sheet}!${cell} did not compute a number (${JSON.stringify(v)})`);
  return v;
}

function valueAt(results: FormulaResult[], sheet: string, cell: string): JsonValue | undefined {
  return results.find((x) => x.sheet === sheet && x.cell === cell)?.value;
}

/** Writes a demo workbook as exceljs lays it out, recalculated by the engine as `fluxbook calc` does. */
async function recalculated(workbook: ExcelJS.Workbook, file: string, overwrite: boolean): Promise<Calculated> {
  const calculated = await calculateWorkbook(Buffer.from(await workbook.xlsx.writeBuffer()));
  await writeAtomically(file, (tmp) => fs.writeFile(tmp, calculated.bytes), { overwrite });
  return calculated;
}

export async function demo(options: DemoOptions): Promise<DemoSummary> {
  await fs.mkdir(options.out, { recursive: true });
  const overwrite = Boolean(options.overwrite);
  const files = [join(options.out, FLEET_FILE), join(options.out, YEAR_FILE), join(options.out, BIDS_FILE)];
  for (const f of files) await checkOutput(f, { overwrite });

  const fleetCalc = await recalculated(fleetWorkbook(), files[0]!, overwrite);
  const yearCalc = await recalculated(yearWorkbook(), files[1]!, overwrite);
  const bidCalc = await recalculated(bidWorkbook(), files[2]!, overwrite);

  const c = FLEET_COLUMNS;
  const rows = FLEET.map((u, i) => ({
    id: u.id,
    location: u.location,
    ok: fleetCalc.results.find((r) => r.cell === `${c.ratioOk}${fleetRow(i)}`)?.value,
    deviation: numberAt(fleetCalc.results, 'Fleet', `${c.deviation}${fleetRow(i)}`),
    efficiency: numberAt(fleetCalc.results, 'Fleet', `${c.eff50}${fleetRow(i)}`),
  }));
  const worst = rows.reduce((a, b) => (b.efficiency < a.efficiency ? b : a));
  return {
    files,
    ratioFailures: rows.filter((r) => r.ok === false).map(({ id, location, deviation }) => ({ id, location, deviation })),
    worstEfficiency: { id: worst.id, location: worst.location, efficiency: worst.efficiency },
    energyLostKwh: numberAt(yearCalc.results, 'Summary', YEAR_CELLS.energyLost),
    allDayEfficiency: numberAt(yearCalc.results, 'Summary', YEAR_CELLS.allDay),
    year: {
      peakHotSpotC: numberAt(yearCalc.results, 'Summary', YEAR_CELLS.peakHotSpot),
      equivalentAging: numberAt(yearCalc.results, 'Summary', YEAR_CELLS.equivalentAging),
      lifeUsedHours: numberAt(yearCalc.results, 'Summary', YEAR_CELLS.lifeUsed),
      lifeFraction: numberAt(yearCalc.results, 'Summary', YEAR_CELLS.lifeFraction),
    },
    bids: {
      offers: OFFERS.map((o, i) => ({
        name: o.name,
        price: o.price,
        toc: numberAt(bidCalc.results, 'Bids', `${OFFER_COLUMNS.toc}${OFFER_ROW + i}`),
        complies: valueAt(bidCalc.results, 'Bids', `${OFFER_COLUMNS.complies}${OFFER_ROW + i}`) === true,
      })),
      recommended: String(valueAt(bidCalc.results, 'Bids', BID_CELLS.recommended)),
      lowestCompliantToc: numberAt(bidCalc.results, 'Bids', BID_CELLS.lowestCompliantToc),
    },
    errors: fleetCalc.errors + yearCalc.errors + bidCalc.errors,
  };
}

const pct = (x: number, digits = 2): string => `${(x * 100).toFixed(digits)} %`;
/** A row of the printout: label, then the value from column 36. */
const line = (label: string, value: string): string => `  ${label.padEnd(31)}  ${value}`;
const money = (x: number): string => Math.round(x).toLocaleString('en-US');
const signedPct = (x: number): string => `${x >= 0 ? '+' : '−'}${Math.abs(x * 100).toFixed(2)} %`;

/** The short table the command prints. */
export function formatDemoSummary(s: DemoSummary): string {
  const lines = [
    'Fernhill Works (fictional campus, invented data) — demo workbooks:',
    ...s.files.map((f) => `  ${f}`),
    '',
    `Ratio check, ±0.5 % of nameplate: ${s.ratioFailures.length} of ${FLEET.length} units fail`,
    ...s.ratioFailures.map((f) => `  ${f.id.padEnd(6)} ${f.location.padEnd(22)} ${signedPct(f.deviation)}`),
    `Worst efficiency at 50 % load:     ${s.worstEfficiency.id} ${s.worstEfficiency.location}, ${pct(s.worstEfficiency.efficiency, 3)}`,
    `${YEAR_UNIT.id} ${YEAR_UNIT.location}, one year of hourly loads:`,
    line('energy lost', `${Math.round(s.energyLostKwh).toLocaleString('en-US')} kWh`),
    line('all-day efficiency', pct(s.allDayEfficiency, 3)),
    line(`peak hot-spot (${YEAR_COOLING})`, `${s.year.peakHotSpotC.toFixed(1)} °C`),
    line('equivalent aging F_EQA', s.year.equivalentAging.toFixed(4)),
    line('insulation life used', `${s.year.lifeUsedHours.toFixed(1)} h, ${pct(s.year.lifeFraction, 3)} of the normal life`),
    `Bids for one ${EVALUATION.kva} kVA unit by total owning cost, with the US DOE 2016 check:`,
    ...s.bids.offers.map((o) =>
      line(o.name, `TOC ${money(o.toc).padStart(7)}  (price ${money(o.price).padStart(7)})  ${o.complies ? 'meets DOE 2016' : 'FAILS DOE 2016'}`),
    ),
    line('recommended', `${s.bids.recommended}, the lowest TOC among compliant offers`),
    '',
    SAFETY_NOTE,
  ];
  if (s.errors > 0) lines.push(`${s.errors} formula cells gave an error; open the workbooks to see which.`);
  return lines.join('\n');
}
