/**
 * `fluxbook demo`: the Fernhill Works workbooks, their summary, and what LibreOffice shows of them
 * (LibreOffice headless converts each sheet to CSV; Debian package libreoffice-calc, installed by
 * .ci/run).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { BIDS_FILE, demo, FLEET_FILE, formatDemoSummary, YEAR_FILE, type DemoSummary } from '../../src/cli/demo';
import {
  BID_CELLS,
  EVALUATION,
  FLEET,
  FLEET_COLUMNS,
  HOURS,
  OFFER_COLUMNS,
  OFFER_ROW,
  OFFERS,
  hottestDay,
  PROFILE_COLUMNS,
  YEAR_BLOCKS,
  YEAR_CELLS,
  YEAR_THERMAL_DATA,
  measuredRatio,
  YEAR_UNIT,
  yearOfAmbients,
  yearOfLoads,
} from '../../src/demo';
import { turnsRatio } from '../../src/core/ratio';
import { withinTolerance, type TestItem } from '../../src/core/testReport';
import { loadLossWorth, noLoadLossWorth, totalOwningCost } from '../../src/core/cost';
import { doeMinimumEfficiency, meetsEfficiencyRule } from '../../src/core/efficiencyRules';
import { cyclicMax, hotSpotAfterStep, loadingYear, maxSteadyLoad, overloadTime, profileCheck, steadyHotSpot, thermalModel } from '../../src/core/thermal';
import { parseCellRef } from '../../src/engine/read';
import { calculateWorkbook, type FormulaResult, type JsonValue } from '../../src/engine/xlsx';
import { xfmr } from '../support/cells';

const recalculated = async (bytes: Buffer): Promise<FormulaResult[]> => (await calculateWorkbook(bytes)).results;
import { fluxbook } from './run';

let dir: string;
let summary: DemoSummary;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'fluxbook-demo-'));
  summary = await demo({ out: dir });
});

afterAll(() => {
  execFileSync('rm', ['-rf', dir]);
});

describe('the Fernhill Works demo', () => {
  it('has 14 units of 500–2500 kVA whose efficiency at half load is that of efficient units', () => {
    expect(FLEET).toHaveLength(14);
    for (const u of FLEET) {
      expect(u.kva).toBeGreaterThanOrEqual(500);
      expect(u.kva).toBeLessThanOrEqual(2500);
      const eff = xfmr('EFF', u.kva, u.p0W, u.pkW, 0.5) as number;
      // common practice: modern liquid-filled distribution units run about 99.0–99.6 % at half load
      expect(eff).toBeGreaterThan(0.99);
      expect(eff).toBeLessThan(0.996);
    }
  });

  it('builds the same year every time from its seed: 8,760 loads with weekday shifts and a summer peak', () => {
    const a = yearOfLoads();
    expect(a).toEqual(yearOfLoads());
    expect(a).toHaveLength(HOURS);
    expect(yearOfLoads(1)).not.toEqual(a);
    const at = (day: number, hour: number) => a[day * 24 + hour]!;
    // 1 January 2025 is a Wednesday: day 4 is Sunday 5 January, day 6 Tuesday 7 January.
    expect(at(6, 10)).toBeGreaterThan(at(4, 10) + 0.4); // the morning shift
    expect(at(6, 3)).toBeLessThan(at(6, 10) - 0.4); // night: base load only
    const mean = (xs: number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;
    const july = Array.from(a.slice(181 * 24, 212 * 24));
    const april = Array.from(a.slice(90 * 24, 120 * 24));
    expect(mean(july)).toBeGreaterThan(mean(april));
    expect(Math.max(...a)).toBeLessThanOrEqual(1.15);
    expect(Math.min(...a)).toBeGreaterThanOrEqual(0.05);
  });

  it('draws the same temperate year of hourly ambients every time: seasons, afternoons warmer than nights', () => {
    const a = yearOfAmbients();
    expect(a).toEqual(yearOfAmbients());
    expect(a).toHaveLength(HOURS);
    expect(yearOfAmbients(1)).not.toEqual(a);
    const mean = (xs: ArrayLike<number>) => Array.from(xs).reduce((s, x) => s + x, 0) / xs.length;
    // common practice: a temperate inland year, a mean near 10 °C, rarely below −15 or above 35 °C
    expect(mean(a)).toBeGreaterThan(8);
    expect(mean(a)).toBeLessThan(13);
    expect(Math.min(...a)).toBeGreaterThan(-15);
    expect(Math.max(...a)).toBeLessThan(35);
    expect(mean(a.slice(181 * 24, 212 * 24))).toBeGreaterThan(mean(a.slice(0, 31 * 24)) + 10); // July vs January
    const atHour = (hour: number) => mean(Array.from({ length: 365 }, (_, d) => a[d * 24 + hour]!));
    expect(atHour(15)).toBeGreaterThan(atHour(3) + 5);
  });

  it('writes three workbooks whose formulas compute without an error', async () => {
    expect(summary.files).toEqual([join(dir, FLEET_FILE), join(dir, YEAR_FILE), join(dir, BIDS_FILE)]);
    expect(summary.errors).toBe(0);
    for (const f of summary.files) {
      const results = await recalculated(readFileSync(f));
      expect(results.filter((r) => r.value !== null && typeof r.value === 'object')).toEqual([]);
    }
  });

  it('summarises the ratio failures, the worst unit at half load, and the year', () => {
    const failing = FLEET.filter((u) => !(xfmr('RATIOOK', (xfmr('RATIO', u.hvV, u.lvV, u.vectorGroup) as number) * (1 + u.ratioOffset), u.hvV, u.lvV, u.vectorGroup) as boolean));
    expect(summary.ratioFailures.map((f) => f.id)).toEqual(failing.map((u) => u.id));
    expect(summary.ratioFailures.map((f) => f.id)).toEqual(['FH-04', 'FH-10']);
    const worst = FLEET.reduce((w, u) => ((xfmr('EFF', u.kva, u.p0W, u.pkW, 0.5) as number) < (xfmr('EFF', w.kva, w.p0W, w.pkW, 0.5) as number) ? u : w));
    expect(summary.worstEfficiency.id).toBe(worst.id);
    const loads = Array.from(yearOfLoads(), (x) => [x]);
    expect(summary.energyLostKwh).toBeCloseTo(xfmr('ELOSS', YEAR_UNIT.p0W, YEAR_UNIT.pkW, loads) as number, 6);
    const text = formatDemoSummary(summary);
    expect(text).toMatch(/2 of 14 units fail/);
    expect(text).toMatch(/FH-04/);
    expect(text).toMatch(/verify with a qualified engineer/);
  });

  it('checks each unit’s test report against its guarantee with one spilling formula per column, as the cores do', async () => {
    const results = await recalculated(readFileSync(summary.files[0]!));
    const c = FLEET_COLUMNS;
    const spill = (col: string) => {
      const r = results.find((x) => x.cell === `${col}2`)!;
      expect(r.formula).toMatch(/^=?XFMR\.TEST(OK|TOL)\(/);
      expect(r.spill?.ref).toBe(`${col}2:${col}${FLEET.length + 1}`);
      return r.spill!.values.map((row) => row[0]);
    };
    const ok = (measured: number, guaranteed: number, item: TestItem, z?: number) => withinTolerance(measured, guaranteed, item, 'IEC', z, 'two-winding');
    expect(spill(c.p0Accepted)).toEqual(FLEET.map((u) => ok(u.p0W, u.guaranteed.p0W, 'no-load loss')));
    expect(spill(c.pkAccepted)).toEqual(FLEET.map((u) => ok(u.pkW, u.guaranteed.pkW, 'load loss')));
    expect(spill(c.totalAccepted)).toEqual(FLEET.map((u) => ok(u.p0W + u.pkW, u.guaranteed.p0W + u.guaranteed.pkW, 'total loss')));
    expect(spill(c.zAccepted)).toEqual(FLEET.map((u) => ok(u.z, u.guaranteed.z, 'impedance')));
    expect(spill(c.ratioAccepted)).toEqual(FLEET.map((u) => ok(measuredRatio(u), turnsRatio(u.hvV, u.lvV, u.vectorGroup), 'ratio', u.z)));
    (spill(c.totalLimit) as number[]).forEach((limit, i) => expect(limit).toBeCloseTo((FLEET[i]!.guaranteed.p0W + FLEET[i]!.guaranteed.pkW) * 1.1, 8));
    // The invented guarantees show each kind of outcome: all pass, components pass but not the total,
    // losses fail, impedance fails, one component fails with the total passing.
    const failing = (col: string) => FLEET.filter((_, i) => spill(col)[i] === false).map((u) => u.id);
    expect(failing(c.totalAccepted)).toEqual(['FH-02', 'FH-07']);
    expect(failing(c.p0Accepted)).toEqual(['FH-07', 'FH-14']);
    expect(failing(c.zAccepted)).toEqual(['FH-10']);
    expect(failing(c.ratioAccepted)).toEqual(['FH-04', 'FH-10']);
  });

  it('the year’s hot-spot, aging and life used are those of the thermal core on the same loads and ambients', async () => {
    const loads = yearOfLoads();
    const ambients = yearOfAmbients();
    // FH-03's own thermal data: its heat-run report's rises and R = Pk/P0 = 16,900 / 2,160.
    expect(YEAR_THERMAL_DATA.lossRatio).toBeCloseTo(7.824, 3);
    const core = loadingYear(loads, ambients, { cooling: 'ONAN', data: YEAR_THERMAL_DATA });
    expect(summary.year.peakHotSpotC).toBeCloseTo(core.peakHotSpot, 10);
    expect(summary.year.equivalentAging).toBeCloseTo(core.equivalentAging, 14);
    expect(summary.year.lifeUsedHours).toBeCloseTo(core.lifeUsedHours, 9);
    expect(summary.year.lifeFraction).toBeCloseTo(core.lifeFraction, 15);
    expect(summary.year.lifeFraction).toBeCloseTo(core.lifeUsedHours / 180_000, 15);
    // A lightly loaded unit in a temperate climate ages far slower than at a steady 110 °C.
    expect(summary.year.equivalentAging).toBeLessThan(0.1);

    // The 8,760-row spill is in the file: an array formula over the column, every value stored.
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(summary.files[1]!);
    const profile = wb.getWorksheet('Profile')!;
    const p = PROFILE_COLUMNS;
    const anchor = profile.getCell(`${p.hotSpot}2`).value as { formula: string; ref: string; shareType: string };
    expect(anchor.formula).toBe(`_xldudf_XFMR_HOTSPOTS(B2:B${HOURS + 1},C2:C${HOURS + 1},1,Summary!$D$2:$E$15)`);
    expect(anchor).toMatchObject({ shareType: 'array', ref: `${p.hotSpot}2:${p.hotSpot}${HOURS + 1}` });
    for (const h of [0, 1, 4000, HOURS - 1]) expect(profile.getCell(`${p.hotSpot}${h + 2}`).result ?? profile.getCell(`${p.hotSpot}${h + 2}`).value).toBeCloseTo(core.hotSpots[h]!, 10);
    expect(profile.getCell(`${p.hotSpot}${HOURS + 2}`).value).toBeNull();

    const results = await recalculated(readFileSync(summary.files[1]!));
    const at = (cell: string) => results.find((r) => r.sheet === 'Summary' && r.cell === cell)!.value as number;
    const hottest = Math.max(...ambients);
    expect(at(YEAR_CELLS.hottestAmbient)).toBe(hottest);
    const unit = thermalModel('IEEE', 'ONAN', YEAR_THERMAL_DATA);
    expect(at(YEAR_CELLS.maxLoadHottest)).toBeCloseTo(maxSteadyLoad(unit, hottest, 110), 12);
  });

  it('the year sheet answers "can FH-03 carry its load?" with the loading core on its own thermal data', async () => {
    const loads = yearOfLoads();
    const ambients = yearOfAmbients();
    const unit = thermalModel('IEEE', 'ONAN', YEAR_THERMAL_DATA);
    const results = await recalculated(readFileSync(summary.files[1]!));
    const at = (cell: string) => results.find((r) => r.sheet === 'Summary' && r.cell === cell)!.value;
    const check = profileCheck(unit, loads, ambients, 1, 'normal', 'distribution');
    expect(at(YEAR_CELLS.loadOk)).toBe(check.withinLimits);
    expect(at(YEAR_CELLS.loadOk)).toBe(true);
    const factor = cyclicMax(unit, loads, ambients, 1, 'normal', 'distribution').factor;
    expect(at(YEAR_CELLS.cyclicMax) as number).toBeCloseTo(factor, 12);
    expect(factor).toBeGreaterThan(1);
    // After the peak of its hottest day, at that day's hottest ambient, 1.3 per unit until 120 °C:
    const day = hottestDay(loads, ambients);
    const dayLoads = loads.subarray(day * 24, day * 24 + 24);
    const peak = Math.max(...dayLoads);
    const ambient = Math.max(...ambients.subarray(day * 24, day * 24 + 24));
    expect(at(YEAR_CELLS.hottestDayPeak)).toBe(peak);
    const hours = overloadTime(unit, peak, 1.3, ambient, 120).hours;
    expect(at(YEAR_CELLS.overload120) as number).toBeCloseTo(hours, 9);
    expect(hotSpotAfterStep(unit, peak, 1.3, hours, ambient)).toBeCloseTo(120, 6);
    expect(at(YEAR_CELLS.settlesAt13) as number).toBeCloseTo(steadyHotSpot(unit, 1.3, ambient), 12);

    // The two spills: the heat-run block every thermal formula reads, and the LOADCHECK report.
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(summary.files[1]!);
    const sheet = wb.getWorksheet('Summary')!;
    const cell = (a: string) => {
      const c = sheet.getCell(a);
      return c.result ?? c.value;
    };
    expect(cell('D6')).toBe('loss ratio R');
    expect(cell('E6') as number).toBeCloseTo(YEAR_THERMAL_DATA.lossRatio, 12);
    expect(cell(YEAR_BLOCKS.check)).toBe('category');
    expect(cell('E21') as number).toBeCloseTo(check.peakHotSpot, 9);
    expect(cell('D28')).toBe('first limit exceeded');
    expect(cell('E28')).toBe('none');
  });

  it('the bid sheet: each TOC is the cost core’s, the offer below the DOE 2016 minimum is flagged, the lowest compliant TOC wins', async () => {
    const e = EVALUATION;
    const a = noLoadLossWorth(e.priceKwh, e.rate, e.years, 8760);
    const b = loadLossWorth(e.priceKwh, e.lossFactor, e.peakLoad, e.rate, e.years, 8760);
    const expected = OFFERS.map((o) => ({
      name: o.name,
      price: o.price,
      toc: totalOwningCost(o.price, o.p0W, o.pkW, a, b),
      complies: meetsEfficiencyRule(e.kva, o.p0W, o.pkW, 'DOE', 'liquid', 3, 2016, undefined),
    }));
    summary.bids.offers.forEach((o, i) => {
      expect(o.name).toBe(expected[i]!.name);
      expect(o.toc).toBeCloseTo(expected[i]!.toc, 8);
      expect(o.complies).toBe(expected[i]!.complies);
    });
    // Offer B: 980 W + 9,800 W/4 at half load is 99.32 % efficient, below the 99.43 % of
    // 10 CFR 431.196 (a)(2) for a 1000 kVA three-phase liquid-immersed unit.
    expect(doeMinimumEfficiency(1000, 'liquid', 3, 2016, undefined)).toBeCloseTo(0.9943, 15);
    const offerB = 500_000 / (500_000 + 980 + 9_800 / 4);
    expect(offerB).toBeCloseTo(0.99319, 5);
    expect(offerB).toBeLessThan(0.9943);
    expect(summary.bids.offers.map((o) => o.complies)).toEqual([true, false, true]);
    const byToc = [...expected].sort((x, y) => x.toc - y.toc);
    expect(byToc.at(-1)!.name).toBe('Offer B'); // cheapest to buy, dearest to own
    expect(Math.min(...OFFERS.map((o) => o.price))).toBe(OFFERS[1]!.price);
    const best = expected.filter((o) => o.complies).reduce((x, y) => (y.toc < x.toc ? y : x));
    expect(summary.bids.recommended).toBe(best.name);
    expect(summary.bids.recommended).toBe('Offer A');
    expect(summary.bids.lowestCompliantToc).toBeCloseTo(best.toc, 8);

    const results = await recalculated(readFileSync(summary.files[2]!));
    const at = (cell: string) => results.find((r) => r.sheet === 'Bids' && r.cell === cell)?.value;
    expect(at(BID_CELLS.aFactor)).toBeCloseTo(a, 12);
    expect(at(BID_CELLS.bFactor)).toBeCloseTo(b, 12);
    expect(at(`${OFFER_COLUMNS.complies}${OFFER_ROW + 1}`)).toBe(false);
    expect(at(`${OFFER_COLUMNS.compliantToc}${OFFER_ROW + 1}`)).toBe('fails DOE 2016');
    expect(at(BID_CELLS.cheapestToBuy)).toBe('Offer B');

    const text = formatDemoSummary(summary);
    expect(text).toMatch(/Offer B .* FAILS DOE 2016/);
    expect(text).toMatch(/recommended +Offer A/);
    expect(text).toMatch(/peak hot-spot \(ONAN\) +\d+\.\d °C/);
  });

  it('refuses to write over its workbooks without --overwrite, and replaces them with it', () => {
    const again = fluxbook('demo', '--out', dir);
    expect(again.status).toBe(2);
    expect(again.stderr).toMatch(/exists already/);
    const forced = fluxbook('demo', '--out', dir, '--overwrite');
    expect(forced.status).toBe(0);
    expect(forced.stdout).toMatch(/Worst efficiency at 50 % load/);
  });
});

/** Values of a CSV line (LibreOffice quotes fields with commas). */
function csvRows(text: string): string[][] {
  const rows: string[][] = [];
  for (const line of text.split(/\r?\n/)) {
    if (line === '') continue;
    const fields: string[] = [];
    let f = '';
    let quoted = false;
    for (let i = 0; i < line.length; i++) {
      const ch = line[i]!;
      if (quoted) {
        if (ch === '"' && line[i + 1] === '"') {
          f += '"';
          i++;
        } else if (ch === '"') quoted = false;
        else f += ch;
      } else if (ch === '"') quoted = true;
      else if (ch === ',') {
        fields.push(f);
        f = '';
      } else f += ch;
    }
    fields.push(f);
    rows.push(fields);
  }
  return rows;
}

/** The error codes a cell of a file can hold (ECMA-376 Part 1 §18.18.80); others are stored as #VALUE!. */
const FILE_ERROR_CODES = new Set(['#NULL!', '#DIV/0!', '#VALUE!', '#REF!', '#NAME?', '#NUM!', '#N/A']);

const cellAt = (a1: string) => parseCellRef(a1)!;

/** A number as LibreOffice writes it with "save cell contents as shown" off: full precision, percent kept. */
function csvNumber(s: string): number {
  return s.endsWith('%') ? Number(s.slice(0, -1)) / 100 : Number(s);
}

const hasSoffice = spawnSync('soffice', ['--version'], { encoding: 'utf8' }).status === 0;

describe.runIf(hasSoffice || process.env.CI)('the demo workbooks in LibreOffice', () => {
  /** Converts every sheet of a workbook to CSV: "sheet to export" −1 = all (LibreOffice 7.2 and later). */
  function toCsv(file: string): Record<string, string[][]> {
    const out = join(dir, 'csv');
    // Fields: comma, double quote, UTF-8, from line 1, default formats, en-US, not quoted as text,
    // detect numbers, values not "as shown" (full precision), no formulas, no trimming, all sheets.
    const filter = 'csv:Text - txt - csv (StarCalc):44,34,76,1,,1033,false,true,false,false,false,-1';
    execFileSync('soffice', ['--headless', '--norestore', `-env:UserInstallation=${pathToFileURL(join(dir, 'lo-profile')).href}`, '--convert-to', filter, '--outdir', out, file], {
      timeout: 120_000,
      stdio: 'pipe',
    });
    const base = file.split('/').pop()!.replace(/\.xlsx$/, '');
    const sheets: Record<string, string[][]> = {};
    for (const name of ['Fleet', 'Curve', 'Summary', 'Profile', 'Bids']) {
      const path = join(out, `${base}-${name}.csv`);
      if (existsSync(path)) sheets[name] = csvRows(readFileSync(path, 'utf8'));
    }
    return sheets;
  }

  async function computed(file: string): Promise<FormulaResult[]> {
    return await recalculated(readFileSync(file));
  }

  const colIndex = (letter: string) => letter.charCodeAt(0) - 65;

  it('shows the numbers Fluxbook computed for the fleet', async () => {
    const csv = toCsv(summary.files[0]!).Fleet!;
    const results = await computed(summary.files[0]!);
    const c = FLEET_COLUMNS;
    let checked = 0;
    for (const col of [c.nameplateRatio, c.deviation, c.ratedCurrent, c.faultCurrent, c.eff50, c.peakLoad, c.pei]) {
      FLEET.forEach((_, i) => {
        const r = results.find((x) => x.cell === `${col}${i + 2}`)!;
        const shown = csvNumber(csv[i + 1]![colIndex(col)]!);
        expect(Math.abs(shown - (r.value as number))).toBeLessThanOrEqual(Math.abs(r.value as number) * 1e-13);
        checked++;
      });
    }
    expect(checked).toBe(7 * 14);
  });

  it('shows the year’s energy lost, all-day efficiency, peak hot-spot, F_EQA and life used Fluxbook computed', () => {
    const csv = toCsv(summary.files[1]!).Summary!;
    const byLabel = Object.fromEntries(csv.map((r) => [r[0], r[1]]));
    expect(csvNumber(byLabel['Energy lost in the year (kWh)']!)).toBeCloseTo(summary.energyLostKwh, 6);
    expect(csvNumber(byLabel['All-day efficiency']!)).toBeCloseTo(summary.allDayEfficiency, 12);
    // MAX over the spilled hot-spots keeps its stored number, though the spill itself shows #NAME?.
    expect(csvNumber(byLabel['Peak hot-spot of the year (°C)']!)).toBeCloseTo(summary.year.peakHotSpotC, 10);
    expect(csvNumber(byLabel['Equivalent aging factor F_EQA']!)).toBeCloseTo(summary.year.equivalentAging, 14);
    expect(csvNumber(byLabel['Life used in the year (h of normal aging)']!)).toBeCloseTo(summary.year.lifeUsedHours, 10);
  });

  it('shows every value of a --values copy, TRUE/FALSE, text, errors and every cell of each spill included', async () => {
    let checked = 0;
    let spilled = 0;
    let logical = 0;
    for (const file of summary.files) {
      const calculated = await calculateWorkbook(readFileSync(file), { values: true });
      const copy = join(dir, `values-${file.split('/').pop()}`);
      writeFileSync(copy, calculated.bytes);
      const sheets = toCsv(copy);
      /** The field LibreOffice shows at an A1 address of a sheet. */
      const shown = (sheet: string, row: number, col: number): string => sheets[sheet]?.[row - 1]?.[col - 1] ?? '';
      const expectShown = (sheet: string, row: number, col: number, v: JsonValue, where: string) => {
        const field = shown(sheet, row, col);
        checked++;
        if (typeof v === 'number') expect(Math.abs(csvNumber(field) - v), `${where}: ${field} vs ${v}`).toBeLessThanOrEqual(Math.abs(v) * 1e-13);
        else if (typeof v === 'boolean') {
          expect(field, where).toBe(v ? 'TRUE' : 'FALSE');
          logical++;
        } else if (typeof v === 'string') expect(field, where).toBe(v);
        else if (v === null) expect(['', '0'], where).toContain(field);
        else {
          const code = FILE_ERROR_CODES.has(v.error) ? v.error : '#VALUE!';
          expect(field, where).toBe(code);
        }
      };
      for (const r of calculated.results) {
        const { row, col } = cellAt(r.cell);
        if (!r.spill) {
          expectShown(r.sheet, row, col, r.value === null ? 0 : r.value, `${r.sheet}!${r.cell}`);
          continue;
        }
        r.spill.values.forEach((values, i) => values.forEach((v, j) => expectShown(r.sheet, row + i, col + j, v, `${r.sheet}!${r.cell} spill [${i}][${j}]`)));
        spilled++;
      }
      for (const [name, rows] of Object.entries(sheets)) expect(rows.flat().filter((f) => f === '#NAME?'), `${name} shows #NAME?`).toEqual([]);
    }
    // The demo has spilled profiles and logical answers (LOADOK, compliance): the check saw them.
    expect(spilled).toBeGreaterThan(0);
    expect(logical).toBeGreaterThan(0);
    expect(checked).toBeGreaterThan(HOURS); // a year's spilled profile at least
  });

  it('shows each offer’s total owning cost and the recommended offer Fluxbook computed', () => {
    const csv = toCsv(summary.files[2]!).Bids!;
    const byLabel = Object.fromEntries(csv.map((r) => [r[0], r]));
    const toc = colIndex(OFFER_COLUMNS.toc);
    for (const o of summary.bids.offers) expect(csvNumber(byLabel[o.name]![toc]!)).toBeCloseTo(o.toc, 8);
    expect(byLabel['Recommended offer']![1]).toBe(summary.bids.recommended);
    expect(csvNumber(byLabel['Lowest total owning cost among compliant offers']![1]!)).toBeCloseTo(summary.bids.lowestCompliantToc, 8);
  });
});
