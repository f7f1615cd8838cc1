import { describe, expect, it } from 'vitest';
import { adapt, CellError, plainErrors } from '../../src/cells/adapter';
import { findFunction } from '../../src/cells/catalog';
import { column, errorOf } from '../support/cells';
import { AGERATE, FAA, FEQA, HOTSPOT, HOTSPOTS, LIFEUSED, MAXLOAD } from '../../src/cells/functions/thermal';

const hotspot = adapt(HOTSPOT, plainErrors);
const faa = adapt(FAA, plainErrors);
const agerate = adapt(AGERATE, plainErrors);
const hotspots = adapt(HOTSPOTS, plainErrors);
const feqa = adapt(FEQA, plainErrors);
const lifeused = adapt(LIFEUSED, plainErrors);
const maxload = adapt(MAXLOAD, plainErrors);

describe('catalog', () => {
  it('holds the seven loading-and-aging functions with the design names and argument order', () => {
    for (const name of ['HOTSPOT', 'FAA', 'AGERATE', 'HOTSPOTS', 'FEQA', 'LIFEUSED', 'MAXLOAD']) expect(findFunction(name)).toBeDefined();
    expect(HOTSPOT.args.map((a) => a.name)).toEqual(['load', 'ambient_c', 'cooling', 'top_oil_rise', 'hs_gradient', 'loss_ratio', 'method']);
    expect(FEQA.args.map((a) => a.name).slice(0, 4)).toEqual(['loads', 'ambients', 'hours', 'cooling']);
    expect(MAXLOAD.args.map((a) => a.name).slice(0, 3)).toEqual(['ambient_c', 'limit_c', 'cooling']);
    expect(HOTSPOTS.kind).toBe('block');
    for (const d of [FEQA, LIFEUSED]) {
      expect(d.kind).toBe('each');
      expect(d.args.filter((a) => a.series).map((a) => a.name)).toEqual(['loads', 'ambients']);
    }
  });

  it('documents the method default and the IEC distribution-transformer choice in the help', () => {
    const method = HOTSPOT.args.find((a) => a.name === 'method')!;
    // Blank means IEEE, or the method of a heat-run block given in place of the cooling name.
    expect(method.optional).toBe(true);
    expect(method.help).toMatch(/"IEEE" \(C57.91 clause 7, the default\)/);
    expect(method.help).toMatch(/ONAN takes the distribution-transformer row/);
    expect(method.help).toMatch(/IEC-POWER/);
  });
});

describe('single values', () => {
  it('HOTSPOT gives 110 °C at rated load and 30 °C by default (IEEE, 65 °C-rise unit) and broadcasts a column', () => {
    expect(hotspot(1, 30)).toEqual([[110]]);
    const r = hotspot(column([0.5, 1, 1.5]), 30, 'onan');
    expect(r).toHaveLength(3);
    expect(r[1]![0]).toBe(110);
    expect(r[0]![0] as number).toBeLessThan(110);
  });

  it('blank optional arguments take their defaults', () => {
    expect(hotspot(1, 30, null, null, '', null, null)).toEqual([[110]]);
    expect(hotspot(1, 20, '', null, null, null, 'IEC')[0]![0]).toBeCloseTo(98, 12);
  });

  it('FAA and AGERATE', () => {
    expect(faa(110)).toEqual([[1]]);
    expect(agerate(104, 'normal')[0]![0]).toBeCloseTo(2, 12);
    expect(agerate(110)).toEqual([[1]]);
  });

  it('MAXLOAD finds rated load at the rated point, #NUM! when no load is low enough', () => {
    expect(maxload(30)[0]![0]).toBeCloseTo(1, 12);
    expect(errorOf(maxload(55, 60)).kind).toBe('NUM');
  });
});

describe('refusals name the argument', () => {
  it('a blank required cell', () => {
    expect(errorOf(hotspot(null, 30)).message).toMatch(/argument load: is blank/);
    expect(errorOf(feqa(null, 25)).message).toMatch(/argument loads: is blank/);
  });

  it('text where a number is needed', () => {
    expect(errorOf(hotspot('full', 30)).message).toMatch(/argument load: "full" is text/);
    expect(errorOf(feqa([[0.5], ['x']], 25)).message).toMatch(/argument loads: value 2/);
  });

  it('an unknown option', () => {
    expect(errorOf(hotspot(1, 30, 'fan')).message).toMatch(/argument cooling:/);
    expect(errorOf(hotspot(1, 30, 'ONAN', null, null, null, 'ANSI')).message).toMatch(/argument method:/);
    expect(errorOf(agerate(110, 'linen')).message).toMatch(/argument paper:/);
  });

  it('out-of-range numbers', () => {
    expect(errorOf(hotspot(1, 75)).message).toMatch(/argument ambient_c:.*-60 to 60/);
    expect(errorOf(hotspot(-1, 30)).message).toMatch(/argument load:/);
    expect(errorOf(hotspot(1, 30, 'ONAN', -5)).message).toMatch(/argument top_oil_rise:/);
    expect(errorOf(faa(900)).message).toMatch(/argument hotspot_c:/);
    expect(errorOf(maxload(30, 20)).message).toMatch(/argument limit_c:/);
    expect(errorOf(feqa(column([1, 1]), 25, 0)).message).toMatch(/argument hours:/);
  });

  it('a series of the wrong length or with a bad step', () => {
    expect(errorOf(feqa(column([1, 1, 1]), column([20, 21]))).message).toMatch(/argument ambients: has 2 values; give one value or one per step of loads \(3\)/);
    expect(errorOf(lifeused(column([1, -2, 1]), 25)).message).toMatch(/argument loads \(step 2\)/);
  });

  it('HOTSPOTS takes single values outside the series', () => {
    expect(errorOf(hotspots(column([1, 1]), 25, [[1, 2]])).message).toMatch(/argument hours: is 1×2 cells/);
  });
});

describe('profiles', () => {
  it('HOTSPOTS spills one row per step, one column', () => {
    const r = hotspots(column([0.6, 0.9, 1.3, 0.7]), 25);
    expect(r).toHaveLength(4);
    for (const row of r) expect(row).toHaveLength(1);
    expect(r[2]![0] as number).toBeGreaterThan(r[1]![0] as number);
  });

  it('drops blank cells after the last value of a range drawn too long', () => {
    expect(hotspots([[0.6], [0.9], [null], ['']], 25)).toHaveLength(2);
  });

  it('ambient as one value or one per step', () => {
    const same = feqa(column([0.8, 1.2]), column([25, 25]));
    expect(feqa(column([0.8, 1.2]), 25)[0]![0]).toBeCloseTo(same[0]![0] as number, 12);
  });

  it('FEQA of a year at the rated point is 1 and LIFEUSED its 8,760 hours', () => {
    const year = column(new Array<number>(8760).fill(1));
    expect(feqa(year, 30)[0]![0]).toBeCloseTo(1, 10);
    expect(lifeused(year, 30)[0]![0]).toBeCloseTo(8760, 6);
    expect(hotspots(year, 30)).toHaveLength(8760);
  });

  it('takes a whole 100,000-row column', () => {
    const rows = column(Array.from({ length: 100_000 }, (_, i) => 0.5 + 0.5 * Math.sin(i / 10)));
    expect(hotspots(rows, 20, 0.25)).toHaveLength(100_000);
    expect(typeof feqa(rows, 20, 0.25)[0]![0]).toBe('number');
  });
});
