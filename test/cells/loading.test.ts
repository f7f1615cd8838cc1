import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { adapt, CellError, plainErrors } from '../../src/cells/adapter';
import { findFunction } from '../../src/cells/catalog';
import { AMBIENTW, CYCLICMAX, LOADCHECK, LOADLIMITS, LOADOK } from '../../src/cells/functions/loading';
import { HEATRUN, HOTSPOT, HOTSPOTS, HOTSPOTSTEP, OVERLOADTIME, TOPOIL, TOPOILS } from '../../src/cells/functions/thermal';
import { cyclicMax, IEEE_ROWS, thermalModel, ultimateHotSpotGradient, type Cooling, type ThermalMethod } from '../../src/core/thermal';

const hotspot = adapt(HOTSPOT, plainErrors);
const topoil = adapt(TOPOIL, plainErrors);
const step = adapt(HOTSPOTSTEP, plainErrors);
const overload = adapt(OVERLOADTIME, plainErrors);
const heatrun = adapt(HEATRUN, plainErrors);
const hotspots = adapt(HOTSPOTS, plainErrors);
const topoils = adapt(TOPOILS, plainErrors);
const limits = adapt(LOADLIMITS, plainErrors);
const ok = adapt(LOADOK, plainErrors);
const check = adapt(LOADCHECK, plainErrors);
const cyclic = adapt(CYCLICMAX, plainErrors);
const ambientw = adapt(AMBIENTW, plainErrors);

const column = (values: readonly number[]) => values.map((v) => [v]);
const value = (r: unknown[][]) => r[0]![0];
function errorOf(result: unknown[][]): CellError {
  const cell = result[0]![0];
  expect(cell).toBeInstanceOf(CellError);
  return cell as CellError;
}
/** The value beside a label in a spilled report. */
const row = (block: unknown[][], label: string) => block.find((r) => r[0] === label)![1];

const day = Array.from({ length: 24 }, (_, h) => 1 + 0.4 * Math.sin((2 * Math.PI * h) / 24));
const press = Array.from({ length: 24 }, (_, h) => (h >= 6 && h < 22 ? 0.75 : 0.25));

describe('catalog', () => {
  it('holds the new functions with the fixed names and argument order', () => {
    for (const name of ['TOPOIL', 'HOTSPOTSTEP', 'OVERLOADTIME', 'LOADLIMITS', 'LOADOK', 'LOADCHECK', 'CYCLICMAX', 'AMBIENTW', 'TOPOILS', 'HEATRUN']) {
      expect(findFunction(name)).toBeDefined();
    }
    expect(TOPOIL.args.map((a) => a.name)).toEqual(['load', 'ambient_c', 'cooling', 'top_oil_rise', 'loss_ratio', 'method']);
    expect(HOTSPOTSTEP.args.map((a) => a.name)).toEqual([
      'load_before', 'load_after', 'hours', 'ambient_c', 'cooling', 'top_oil_rise', 'hs_gradient', 'loss_ratio', 'tau_oil_min', 'tau_winding_min', 'method',
    ]);
    expect(OVERLOADTIME.args.map((a) => a.name)).toEqual([
      'load_before', 'load_after', 'ambient_c', 'limit_c', 'cooling', 'top_oil_rise', 'hs_gradient', 'loss_ratio', 'tau_oil_min', 'tau_winding_min', 'method',
    ]);
    expect(OVERLOADTIME.args[3]!.default).toBe(120);
    expect(COOLING_FIRST_OF_MODEL).toBe(true);
  });

  it('carries the beyond-nameplate caution in the help of every function that speaks of it', () => {
    for (const d of [HOTSPOTSTEP, OVERLOADTIME, LOADLIMITS, LOADOK, LOADCHECK, CYCLICMAX]) {
      expect(d.help).toMatch(/manufacturer’s data, the owner’s practice and local codes govern/);
    }
  });
});

/** Every profile and step function reads the unit's model from the same arguments, cooling first. */
const COOLING_FIRST_OF_MODEL = [HOTSPOT, TOPOIL, HOTSPOTSTEP, OVERLOADTIME, HOTSPOTS, TOPOILS, LOADOK, LOADCHECK, CYCLICMAX].every((d) => {
  const names = d.args.map((a) => a.name);
  return names.includes('cooling') && names.indexOf('method') === names.length - 1 && names.indexOf('top_oil_rise') === names.indexOf('cooling') + 1;
});

describe('steady state', () => {
  it('TOPOIL is 85 °C at rated load and 30 °C (55 K top-oil rise, IEEE default)', () => {
    expect(value(topoil(1, 30))).toBe(85);
  });

  it('TOPOIL + hot-spot gradient × load^(2m) = HOTSPOT (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2.5, noNaN: true }), fc.double({ min: -30, max: 50, noNaN: true }), fc.constantFrom<Cooling>('ONAN', 'ONAF', 'OF', 'OD'), fc.constantFrom<ThermalMethod>('IEEE', 'IEC', 'IEC-POWER'), (k, a, c, m) => {
        const top = value(topoil(k, a, c, null, null, m)) as number;
        const hot = value(hotspot(k, a, c, null, null, null, m)) as number;
        const gradient = hot - top;
        const row = findModel(c, m);
        expect(gradient).toBeCloseTo(ultimateHotSpotGradient(row, k), 9);
      }),
      { numRuns: 300 },
    );
  });
});

const findModel = (c: Cooling, m: ThermalMethod) => thermalModel(m, c);

describe('step load', () => {
  it('HOTSPOTSTEP: 0.6 → 1.3 pu for 4 h at 30 °C reaches 137.7 °C (IEEE C57.91 clause 7 time constant)', () => {
    expect(value(step(0.6, 1.3, 4, 30)) as number).toBeCloseTo(137.708, 3);
    expect(value(step(0.6, 1.3, 0, 30)) as number).toBeCloseTo(value(hotspot(0.6, 30)) as number, 12);
  });

  it('the time constants from cells change the answer', () => {
    const slower = value(step(0.6, 1.3, 1, 30, 'ONAN', null, null, null, 300)) as number;
    expect(slower).toBeLessThan(value(step(0.6, 1.3, 1, 30)) as number);
  });

  it('OVERLOADTIME then HOTSPOTSTEP at that time gives limit_c, for every method and cooling (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 1.2, max: 2, noNaN: true }),
        fc.double({ min: -10, max: 40, noNaN: true }),
        fc.constantFrom('ONAN', 'ONAF', 'OFAF', 'ODAF'),
        fc.constantFrom('IEEE', 'IEC', 'IEC-POWER'),
        (k1, k2, a, c, m) => {
          const before = value(hotspot(k1, a, c, null, null, null, m)) as number;
          const after = value(hotspot(k2, a, c, null, null, null, m)) as number;
          const limit = Math.min(200, Math.max(60, a + 1, (before + after) / 2));
          const t = value(overload(k1, k2, a, limit, c, null, null, null, null, null, m));
          if (t instanceof CellError) {
            expect(t.kind).toBe('NUM');
            return;
          }
          if ((t as number) === 0) {
            expect(before).toBeGreaterThanOrEqual(limit);
            return;
          }
          expect(value(step(k1, k2, t as number, a, c, null, null, null, null, null, m)) as number).toBeCloseTo(limit, 6);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('OVERLOADTIME says when the limit is never reached, and 0 when it is there from the start', () => {
    const never = errorOf(overload(0.6, 1.0, 30, 120));
    expect(never.kind).toBe('NUM');
    expect(never.message).toMatch(/never reaches 120 °C: it settles at 110 °C/);
    expect(value(overload(1.5, 1.5, 30, 120))).toBe(0);
  });

  it('refuses negative hours and a limit below the ambient, naming the argument', () => {
    expect(errorOf(step(0.6, 1.3, -1, 30)).message).toMatch(/^argument hours: must be 0 or more/);
    expect(errorOf(overload(0.6, 1.3, 30, 20)).message).toMatch(/^argument limit_c:/);
    expect(errorOf(overload(0.6, 1.3, 60, 60)).message).toMatch(/^argument limit_c: 60 °C is not above ambient_c/);
    expect(errorOf(step(-0.1, 1.3, 1, 30)).message).toMatch(/^argument load_before:/);
    expect(errorOf(step(0.6, 1.3, 1, 30, 'ONAN', null, null, null, -5)).message).toMatch(/^argument tau_oil_min:/);
  });
});

describe('profiles', () => {
  it('TOPOILS spills beside HOTSPOTS, below it by the gradient', () => {
    const hot = hotspots(column(day), 30);
    const oil = topoils(column(day), 30);
    expect(oil).toHaveLength(24);
    for (let i = 0; i < 24; i++) expect((hot[i]![0] as number) - (oil[i]![0] as number)).toBeGreaterThan(0);
  });

  it('a single ambient cell is a constant ambient everywhere a profile of ambients is taken', () => {
    const same = column(new Array<number>(24).fill(25));
    for (const f of [hotspots, topoils, check]) expect(f(column(day), 25)).toEqual(f(column(day), same));
    expect(value(ok(column(press), 25))).toEqual(value(ok(column(press), same)));
    expect(value(cyclic(column(press), 25))).toEqual(value(cyclic(column(press), same)));
  });

  it('AMBIENTW of the sample year, given straight to a profile function', () => {
    const months = column([-2, -1, 3, 8, 13, 17, 19, 18, 14, 9, 4, 0]);
    const w = value(ambientw(months)) as number;
    expect(w).toBeCloseTo(8.5 + 0.01 * 21 ** 1.85, 12);
    expect(typeof value(cyclic(column(press), w))).toBe('number');
    expect(errorOf(ambientw(column([10, 12]))).message).toMatch(/^argument monthly_means: has 2 values/);
  });
});

describe('loading categories', () => {
  it('LOADLIMITS spills the IEEE normal life expectancy limits with their source', () => {
    const b = limits('normal');
    expect(row(b, 'top-oil limit (°C)')).toBe(105);
    expect(row(b, 'hot-spot limit (°C)')).toBe(120);
    expect(row(b, 'load limit (per unit)')).toBe(2);
    expect(row(b, 'normal aging required (F_EQA ≤ 1)')).toBe(true);
    expect(row(b, 'gas-bubble caution above (°C)')).toBe(140);
    expect(row(b, 'source')).toMatch(/IEEE C57.91.*from memory/);
    expect(row(limits('long', 'large', 'IEC'), 'load limit (per unit)')).toBe(1.3);
  });

  it('refuses an unknown category or size and IEC planned loading, naming the argument', () => {
    expect(errorOf(limits('overnight')).message).toMatch(/^argument category: "overnight" is not one of/);
    expect(errorOf(limits('normal', 'huge')).message).toMatch(/^argument size:/);
    expect(errorOf(limits('planned', 'distribution', 'IEC')).message).toMatch(/^argument category: IEC 60076-7 has no planned-loading category/);
    expect(errorOf(ok(column(day), 30, 1, 'overnight')).message).toMatch(/^argument category:/);
    expect(errorOf(cyclic(column(day), 30, -1)).message).toMatch(/^argument hours:/);
  });

  it('LOADCHECK reports the first limit exceeded with its step', () => {
    const b = check(column(day), 30);
    expect(row(b, 'first limit exceeded')).toBe('hot-spot 120 °C');
    expect(row(b, 'within limits')).toBe(false);
    expect(row(b, 'peak load (per unit)')).toBeCloseTo(1.4, 12);
    expect(row(b, 'hot-spot above 140 °C (gas bubbles)')).toBe(true);
    const light = check(column(press), 20);
    expect(row(light, 'first limit exceeded')).toBe('none');
    expect(row(light, 'at step')).toBeDefined();
    expect(row(light, 'within limits')).toBe(true);
  });

  it('LOADCHECK names the aging budget when only normal aging is exceeded', () => {
    // A steady 1.05 pu at 30 °C: hot-spot 114 °C, under every temperature limit, but F_EQA above 1.
    const b = check(column(new Array<number>(24).fill(1.05)), 30);
    expect(row(b, 'first limit exceeded')).toMatch(/^normal aging \(F_EQA/);
    expect(row(b, 'F_EQA') as number).toBeGreaterThan(1);
  });

  const cases: [string, readonly number[], number, string, string, string][] = [
    ['IEEE normal, press shop at 30 °C', press, 30, 'normal', 'distribution', 'IEEE'],
    ['IEEE planned, daily cycle at 20 °C', day, 20, 'planned', 'distribution', 'IEEE'],
    ['IEEE short-time emergency', day, 30, 'short-time emergency', 'distribution', 'IEEE'],
    ['IEC normal, medium power ONAN', press, 25, 'normal', 'medium power', 'IEC-POWER'],
    ['IEC long-time emergency, distribution', day, 10, 'long-time emergency', 'distribution', 'IEC'],
    ['IEC short-time emergency, distribution (load-bound)', press, 10, 'short-time emergency', 'distribution', 'IEC'],
  ];
  it.each(cases)('%s: LOADOK of the profile × CYCLICMAX is TRUE and × 1.01 FALSE', (_n, profile, a, cat, sz, m) => {
    const f = value(cyclic(column(profile), a, 1, cat, sz, 'ONAN', null, null, null, m)) as number;
    expect(typeof f).toBe('number');
    const scaled = (x: number) => column(profile.map((k) => k * x));
    expect(value(ok(scaled(f), a, 1, cat, sz, 'ONAN', null, null, null, m))).toBe(true);
    expect(value(ok(scaled(f * 1.01), a, 1, cat, sz, 'ONAN', null, null, null, m))).toBe(false);
  });

  it('CYCLICMAX of an 8,760-hour year takes at most 40 runs of the profile', () => {
    const year = Float64Array.from({ length: 8760 }, (_, i) => 0.55 + 0.35 * Math.sin((2 * Math.PI * (i - 8)) / 24) + 0.1 * Math.sin(i / 37));
    const ambients = Float64Array.from({ length: 8760 }, (_, i) => 12 + 10 * Math.sin((2 * Math.PI * (i - 2900)) / 8760) + 4 * Math.sin((2 * Math.PI * i) / 24));
    for (const cat of ['normal', 'planned', 'long-time emergency', 'short-time emergency'] as const) {
      const r = cyclicMax(IEEE_ROWS.ONAN, year, ambients, 1, cat, 'distribution');
      expect(r.evaluations).toBeLessThanOrEqual(40);
      expect(r.factor).toBeGreaterThan(0);
    }
  });

  it('CYCLICMAX is #NUM! when even no load passes', () => {
    // A unit whose top-oil rise comes from the no-load loss alone (loss ratio 0) at 60 °C ambient:
    // 60 + 55 = 115 °C top oil with no load, above the 105 °C of normal loading.
    const r = cyclic(column(press), 60, 1, 'normal', 'distribution', 'ONAN', null, null, 0);
    expect(errorOf(r).kind).toBe('NUM');
  });
});

describe('heat-run block', () => {
  it('HEATRUN spills 14 labelled rows with the table values where blank', () => {
    const b = heatrun('ONAN');
    expect(b).toHaveLength(14);
    expect(b[0]).toEqual(['method', 'IEEE']);
    expect(row(b, 'loss ratio R')).toBe(5);
    expect(row(b, 'paper')).toBe('upgraded');
    expect(row(heatrun('ONAN', 'IEC'), 'paper')).toBe('normal');
    expect(row(heatrun('ONAN', 'IEC', null, 20, 1.2), 'hot-spot gradient (K)')).toBeCloseTo(24, 12);
    expect(row(heatrun('ONAN', 'IEEE', null, null, null, 7.8), 'loss ratio R')).toBe(7.8);
  });

  it('refuses a bad heat-run value by its argument name', () => {
    expect(errorOf(heatrun('ONAN', 'IEEE', null, null, null, null, null, null, 5)).message).toMatch(/^argument n:/);
    expect(errorOf(heatrun('ONAN', 'IEEE', null, null, 1.3)).message).toMatch(/^argument hs_factor:/);
  });
});

describe('heat-run block in place of the cooling name', () => {
  // A unit's heat-run report typed once: IEEE, ONAN, 52 K top oil, 24 K gradient, R = 7.8.
  const unit = heatrun('ONAN', 'IEEE', 52, 24, null, 7.8);
  const own = [52, 24, 7.8] as const;

  it('gives every thermal function the same answer as the values typed into its own arguments', () => {
    expect(value(hotspot(1.2, 30, unit))).toBe(value(hotspot(1.2, 30, 'ONAN', ...own)));
    expect(value(topoil(1.2, 30, unit))).toBe(value(topoil(1.2, 30, 'ONAN', 52, 7.8)));
    expect(value(step(0.6, 1.3, 2, 30, unit))).toBe(value(step(0.6, 1.3, 2, 30, 'ONAN', ...own)));
    expect(value(overload(0.6, 1.3, 30, 140, unit))).toBe(value(overload(0.6, 1.3, 30, 140, 'ONAN', ...own)));
    expect(hotspots(column(day), 30, 1, unit)).toEqual(hotspots(column(day), 30, 1, 'ONAN', ...own));
    expect(check(column(press), 30, 1, 'normal', 'distribution', unit)).toEqual(check(column(press), 30, 1, 'normal', 'distribution', 'ONAN', ...own));
    expect(value(cyclic(column(press), 30, 1, 'normal', 'distribution', unit))).toBe(value(cyclic(column(press), 30, 1, 'normal', 'distribution', 'ONAN', ...own)));
  });

  it('carries the time constants, exponents, k11 k21 k22, paper and normal life that no other argument list has', () => {
    const iec = heatrun('ONAF', 'IEC', null, null, null, null, 120, 6, 0.85, 0.7, 0.6, 1.8, 1.5, 'upgraded', 150000);
    const slower = heatrun('ONAF', 'IEC');
    expect(value(step(0.6, 1.4, 1, 20, iec))).not.toBe(value(step(0.6, 1.4, 1, 20, slower)));
    const r = check(column(day), 20, 1, 'normal', 'medium', iec);
    const feqa = adapt(findFunction('FEQA')!, plainErrors);
    expect(row(r, 'F_EQA')).toBeCloseTo(value(feqa(column(day), 20, 1, iec)) as number, 12);
    expect(row(r, 'life used (fraction of normal life)')).toBeCloseTo((row(r, 'life used (h)') as number) / 150000, 15);
  });

  it("takes the block's method when method is blank and refuses a different one", () => {
    const iec = heatrun('ONAN', 'IEC');
    expect(value(hotspot(1, 20, iec))).toBeCloseTo(98, 12);
    expect(value(hotspot(1, 20, iec, null, null, null, 'IEC'))).toBeCloseTo(98, 12);
    expect(errorOf(hotspot(1, 20, iec, null, null, null, 'IEEE')).message).toMatch(/^argument method: "IEEE" contradicts the heat-run block in cooling/);
  });

  it("lets a value in the formula's own arguments replace the block's", () => {
    expect(value(hotspot(1, 30, unit, 55, 25, 5))).toBe(110);
  });

  it('refuses a range that is not a heat-run block, naming cooling and the row', () => {
    // A range of another shape is broadcast as cooling names, as for any text argument.
    const broadcast = hotspot(1, 30, [['ONAN'], ['x']]);
    expect(broadcast[0]![0]).toBe(110);
    expect(errorOf([broadcast[1]!]).message).toMatch(/^argument cooling: "x" is not one of/);
    const relabelled = unit.map((r, i) => (i === 3 ? ['gradient', r[1]] : r));
    expect(errorOf(hotspot(1, 30, relabelled)).message).toMatch(/^argument cooling: row 4 \("hot-spot gradient \(K\)"\) is labelled "gradient"/);
    const bad = unit.map((r, i) => (i === 7 ? [r[0], 9] : r));
    expect(errorOf(hotspot(1, 30, bad)).message).toMatch(/^argument cooling: heat-run block: n: /);
    const noText = unit.map((r, i) => (i === 1 ? [r[0], 'fan'] : r));
    expect(errorOf(hotspot(1, 30, noText)).message).toMatch(/^argument cooling: heat-run block: cooling: "fan" is not one of/);
  });

  it('is read whole, never broadcast: a column of loads beside it still spills one value per load', () => {
    const r = hotspot(column([0.5, 1, 1.5]), 30, unit);
    expect(r).toHaveLength(3);
    expect(r[1]![0]).toBe(value(hotspot(1, 30, 'ONAN', ...own)));
  });
});
