/** Regulation and impedance cells: the chain RPCT → XPCT → REG, ZBASE and the SHARE spill. */
import { describe, expect, it } from 'vitest';
import { cellFunction, errorOf, firstCell } from '../support/cells';

describe('regulation and impedance cells', () => {
  it('RPCT and XPCT chain to REG; leading defaults to FALSE', () => {
    const r = firstCell(cellFunction('RPCT')(10500, 1000)) as number;
    const x = firstCell(cellFunction('XPCT')(0.0575, r)) as number;
    const lag = firstCell(cellFunction('REG')(r, x, 1, 0.85, null)) as number;
    const lead = firstCell(cellFunction('REG')(r, x, 1, 0.85, true)) as number;
    expect(lag).toBeGreaterThan(0);
    expect(lead).toBeLessThan(lag);
    expect(firstCell(cellFunction('REG')(r, x, 1, 0.85, 'FALSE'))).toBe(lag);
  });
  it('an impedance typed without the % sign gets the hint', () => {
    expect(errorOf(cellFunction('XPCT')(5.75, 0.01)).message).toMatch(/5\.75%/);
  });
  it('ZBASE of 480 V, 1000 kVA', () => {
    expect(firstCell(cellFunction('ZBASE')(480, 1000))).toBeCloseTo(0.2304, 12);
  });
  it('SHARE spills one row per unit: share | loading | overloaded', () => {
    const out = cellFunction('SHARE')([[1000], [500]], [[0.05], [0.06]], 1500);
    expect(out).toHaveLength(2);
    expect(out[0]).toHaveLength(3);
    expect((out[0]![0] as number) + (out[1]![0] as number)).toBeCloseTo(1500, 9);
    expect(out[0]![2]).toBe(true);
    expect(out[1]![2]).toBe(false);
  });
  it('SHARE takes one impedance for all units, and refuses a range for the load', () => {
    const out = cellFunction('SHARE')([[750, 750]], 0.0575, 1000);
    expect(out).toEqual([
      [500, 500 / 750, false],
      [500, 500 / 750, false],
    ]);
    expect(errorOf(cellFunction('SHARE')([[750], [750]], 0.0575, [[1000], [900]])).message).toMatch(/single value/);
  });
});
