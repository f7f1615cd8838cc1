/** `fluxbook demo [--out DIR]`: writes the Fernhill Works workbooks, recalculated, and sums them up. */
import { promises as fs } from 'node:fs';
import { join } from 'node:path';
import { SAFETY_NOTE } from '../cells/metadata';
import type { FormulaResult, JsonValue } from '../engine/xlsx';
import { recalculateAndSave } from './calc';
import { FLEET, FLEET_COLUMNS, fleetWorkbook, YEAR_CELLS, YEAR_UNIT, yearWorkbook } from './fernhill';
import { checkOutput, writeAtomically } from './files';

export const FLEET_FILE = 'fernhill-fleet.xlsx';
export const YEAR_FILE = 'fernhill-year.xlsx';

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
  readonly errors: number;
}

function numberAt(results: FormulaResult[], sheet: string, cell: string): number {
  const r = results.find((x) => x.sheet === sheet && x.cell === cell);
  const v: JsonValue | undefined = r?.value;
  if (typeof v !== 'number') throw new Error(`demo: ${sheet}!${cell} did not compute a number (${JSON.stringify(v)})`);
  return v;
}

export async function demo(options: DemoOptions): Promise<DemoSummary> {
  await fs.mkdir(options.out, { recursive: true });
  const overwrite = Boolean(options.overwrite);
  const files = [join(options.out, FLEET_FILE), join(options.out, YEAR_FILE)];
  for (const f of files) await checkOutput(f, { overwrite });

  const fleet = fleetWorkbook();
  const fleetCalc = await recalculateAndSave(fleet, () => writeAtomically(files[0]!, (tmp) => fleet.xlsx.writeFile(tmp), { overwrite }));
  const year = yearWorkbook();
  const yearCalc = await recalculateAndSave(year, () => writeAtomically(files[1]!, (tmp) => year.xlsx.writeFile(tmp), { overwrite }));

  const c = FLEET_COLUMNS;
  const rows = FLEET.map((u, i) => ({
    id: u.id,
    location: u.location,
    ok: fleetCalc.results.find((r) => r.cell === `${c.ratioOk}${i + 2}`)?.value,
    deviation: numberAt(fleetCalc.results, 'Fleet', `${c.deviation}${i + 2}`),
    efficiency: numberAt(fleetCalc.results, 'Fleet', `${c.eff50}${i + 2}`),
  }));
  const worst = rows.reduce((a, b) => (b.efficiency < a.efficiency ? b : a));
  return {
    files,
    ratioFailures: rows.filter((r) => r.ok === false).map(({ id, location, deviation }) => ({ id, location, deviation })),
    worstEfficiency: { id: worst.id, location: worst.location, efficiency: worst.efficiency },
    energyLostKwh: numberAt(yearCalc.results, 'Summary', YEAR_CELLS.energyLost),
    allDayEfficiency: numberAt(yearCalc.results, 'Summary', YEAR_CELLS.allDay),
    errors: fleetCalc.errors + yearCalc.errors,
  };
}

const pct = (x: number, digits = 2): string => `${(x * 100).toFixed(digits)} %`;
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
    `  energy lost                      ${Math.round(s.energyLostKwh).toLocaleString('en-US')} kWh`,
    `  all-day efficiency               ${pct(s.allDayEfficiency, 3)}`,
    '',
    SAFETY_NOTE,
  ];
  if (s.errors > 0) lines.push(`${s.errors} formula cells gave an error; open the workbooks to see which.`);
  return lines.join('\n');
}
