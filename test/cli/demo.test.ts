/**
 * `fluxbook demo`: the Fernhill Works workbooks, their summary, and what LibreOffice shows of them
 * (LibreOffice headless converts each sheet to CSV; Debian package libreoffice-calc, installed by
 * .ci/run).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adapt, plainErrors } from '../../src/cells/adapter';
import { findFunction } from '../../src/cells/catalog';
import { demo, FLEET_FILE, formatDemoSummary, YEAR_FILE, type DemoSummary } from '../../src/cli/demo';
import { FLEET, FLEET_COLUMNS, HOURS, YEAR_UNIT, yearOfLoads } from '../../src/cli/fernhill';
import { loadWorkbook, recalculate, type FormulaResult } from '../../src/engine/xlsx';
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

const call = (name: string, ...args: unknown[]) => adapt(findFunction(name)!, plainErrors)(...args)[0]![0];

describe('the Fernhill Works demo', () => {
  it('has 14 units of 500–2500 kVA whose efficiency at half load is that of efficient units', () => {
    expect(FLEET).toHaveLength(14);
    for (const u of FLEET) {
      expect(u.kva).toBeGreaterThanOrEqual(500);
      expect(u.kva).toBeLessThanOrEqual(2500);
      const eff = call('EFF', u.kva, u.p0W, u.pkW, 0.5) as number;
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

  it('writes two workbooks whose formulas compute without an error', async () => {
    expect(summary.files).toEqual([join(dir, FLEET_FILE), join(dir, YEAR_FILE)]);
    expect(summary.errors).toBe(0);
    for (const f of summary.files) {
      const results = recalculate(await loadWorkbook(readFileSync(f)));
      expect(results.filter((r) => r.value !== null && typeof r.value === 'object')).toEqual([]);
    }
  });

  it('summarises the ratio failures, the worst unit at half load, and the year', () => {
    const failing = FLEET.filter((u) => !(call('RATIOOK', (call('RATIO', u.hvV, u.lvV, u.vectorGroup) as number) * (1 + u.ratioOffset), u.hvV, u.lvV, u.vectorGroup) as boolean));
    expect(summary.ratioFailures.map((f) => f.id)).toEqual(failing.map((u) => u.id));
    expect(summary.ratioFailures.map((f) => f.id)).toEqual(['FH-04', 'FH-10']);
    const worst = FLEET.reduce((w, u) => ((call('EFF', u.kva, u.p0W, u.pkW, 0.5) as number) < (call('EFF', w.kva, w.p0W, w.pkW, 0.5) as number) ? u : w));
    expect(summary.worstEfficiency.id).toBe(worst.id);
    const loads = Array.from(yearOfLoads(), (x) => [x]);
    expect(summary.energyLostKwh).toBeCloseTo(call('ELOSS', YEAR_UNIT.p0W, YEAR_UNIT.pkW, loads) as number, 6);
    const text = formatDemoSummary(summary);
    expect(text).toMatch(/2 of 14 units fail/);
    expect(text).toMatch(/FH-04/);
    expect(text).toMatch(/verify with a qualified engineer/);
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
    for (const name of ['Fleet', 'Curve', 'Summary', 'Profile']) {
      const path = join(out, `${base}-${name}.csv`);
      if (existsSync(path)) sheets[name] = csvRows(readFileSync(path, 'utf8'));
    }
    return sheets;
  }

  async function computed(file: string): Promise<FormulaResult[]> {
    return recalculate(await loadWorkbook(readFileSync(file)));
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

  it('shows the year’s energy lost and all-day efficiency Fluxbook computed', () => {
    const csv = toCsv(summary.files[1]!).Summary!;
    const byLabel = Object.fromEntries(csv.map((r) => [r[0], r[1]]));
    expect(csvNumber(byLabel['Energy lost in the year (kWh)']!)).toBeCloseTo(summary.energyLostKwh, 6);
    expect(csvNumber(byLabel['All-day efficiency']!)).toBeCloseTo(summary.allDayEfficiency, 12);
  });
});
