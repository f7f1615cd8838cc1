import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors';
import { parseVectorGroup, phaseDisplacement } from '../../src/core/vectorGroup';

describe('parseVectorGroup', () => {
  it('reads HV connection, LV connection and clock number', () => {
    expect(parseVectorGroup('g', 'Dyn11')).toMatchObject({ hv: 'D', hvNeutral: false, lv: 'Y', lvNeutral: true, clock: 11 });
    expect(parseVectorGroup('g', 'YNd1')).toMatchObject({ hv: 'Y', hvNeutral: true, lv: 'D', clock: 1 });
    expect(parseVectorGroup('g', 'Dzn0')).toMatchObject({ hv: 'D', lv: 'Z', lvNeutral: true, clock: 0 });
  });

  it('accepts any letter case, as users type it', () => {
    expect(parseVectorGroup('g', 'DYN11').text).toBe('Dyn11');
    expect(parseVectorGroup('g', ' ynd1 ').text).toBe('YNd1');
  });

  it('refuses clock numbers that a pair of connections cannot give (common practice)', () => {
    expect(() => parseVectorGroup('g', 'Dyn0')).toThrow(/odd clock number/);
    expect(() => parseVectorGroup('g', 'Yy1')).toThrow(/even clock number/);
    expect(() => parseVectorGroup('g', 'Dy12')).toThrow(/0 to 11/);
  });

  it('refuses text that is not a vector group, naming the argument', () => {
    try {
      parseVectorGroup('vector_group', 'delta-star');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      expect((error as InputError).argument).toBe('vector_group');
    }
  });

  it('gives the displacement as clock × 30°', () => {
    expect(phaseDisplacement(parseVectorGroup('g', 'Dyn5'))).toBe(150);
  });
});
