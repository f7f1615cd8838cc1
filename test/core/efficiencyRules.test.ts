import { describe, expect, it } from 'vitest';
import {
  bilBand,
  DOE_TABLES,
  doeMinimumEfficiency,
  EU_TIER2_LIQUID,
  euMaximumLoss,
  meetsEfficiencyRule,
} from '../../src/core/efficiencyRules';
import { InputError, NotInTableError } from '../../src/core/errors';

describe('DOE tables', () => {
  it.each(DOE_TABLES.map((t) => [`${t.kind} ${t.phases}-phase ${t.levels} ${t.bil ?? ''}`, t] as const))(
    '%s: kVA ascending, efficiencies between 97 % and 100 %, paragraph cited',
    (_label, t) => {
      expect(t.rows.length).toBeGreaterThan(5);
      t.rows.forEach((r, i) => {
        expect(r.percent).toBeGreaterThan(97);
        expect(r.percent).toBeLessThan(100);
        if (i > 0) expect(r.kva).toBeGreaterThan(t.rows[i - 1]!.kva);
      });
      expect(t.paragraph).toMatch(/^431\.196\([abc]\)\(\d\)$/);
    },
  );
  it('every table row is returned exactly at its own rating', () => {
    for (const t of DOE_TABLES) {
      const bil = t.bil === '20-45 kV' ? 30 : t.bil === '46-95 kV' ? 95 : t.bil === '>=96 kV' ? 125 : undefined;
      for (const r of t.rows) expect(doeMinimumEfficiency(r.kva, t.kind, t.phases, t.levels, bil)).toBe(r.percent / 100);
    }
  });
});

describe('doeMinimumEfficiency', () => {
  it('liquid-immersed three-phase 500 kVA, 2016 levels: 99.35 %', () => {
    expect(doeMinimumEfficiency(500, 'liquid', 3, 2016, undefined)).toBeCloseTo(0.9935, 12);
  });
  it('2029 levels are the stricter ones for liquid-immersed three-phase 1000 kVA (99.46 % against 99.43 %)', () => {
    expect(doeMinimumEfficiency(1000, 'liquid', 3, 2029, undefined)).toBeCloseTo(0.9946, 12);
  });
  it('submersible units keep the 2016 values in 2029', () => {
    expect(doeMinimumEfficiency(1000, 'submersible', 3, 2029, undefined)).toBeCloseTo(0.9943, 12);
  });
  it('ratings outside a table have no row: #N/A with the table range', () => {
    expect(() => doeMinimumEfficiency(3000, 'liquid', 3, 2016, undefined)).toThrow(NotInTableError);
    expect(() => doeMinimumEfficiency(5, 'liquid', 1, 2016, undefined)).toThrow(/from 10 to 833 kVA/);
    expect(() => doeMinimumEfficiency(3750, 'liquid', 3, 2029, undefined)).not.toThrow();
  });
  it('medium-voltage dry-type needs the BIL; a ≥ 96 kV unit below the first printed row has none', () => {
    expect(() => doeMinimumEfficiency(300, 'mvdry', 3, 2016, undefined)).toThrow(/bil_kv/);
    expect(doeMinimumEfficiency(300, 'mvdry', 3, 2016, 95)).toBeCloseTo(0.9881, 12);
    expect(doeMinimumEfficiency(300, 'mvdry', 3, 2016, 110)).toBeCloseTo(0.9869, 12);
    expect(() => doeMinimumEfficiency(150, 'mvdry', 3, 2016, 125)).toThrow(/from 225 to 2500 kVA/);
  });
  it('refuses unknown phases and levels', () => {
    expect(() => doeMinimumEfficiency(500, 'liquid', 2, 2016, undefined)).toThrow(/phases/);
    expect(() => doeMinimumEfficiency(500, 'liquid', 3, 2020, undefined)).toThrow(/levels/);
  });
});

describe('bilBand', () => {
  it('reads the table headings 20–45, 46–95 and ≥ 96 kV', () => {
    expect(bilBand(20)).toBe('20-45 kV');
    expect(bilBand(45)).toBe('20-45 kV');
    expect(bilBand(60)).toBe('46-95 kV');
    expect(bilBand(95)).toBe('46-95 kV');
    expect(bilBand(96)).toBe('>=96 kV');
    expect(() => bilBand(10)).toThrow(InputError);
  });
});

describe('EU Tier 2 table (values from memory)', () => {
  it('rows ascend in kVA and in both losses, and carry their source', () => {
    EU_TIER2_LIQUID.forEach((r, i) => {
      expect(r.source).toMatch(/from memory/);
      if (i > 0) {
        const prev = EU_TIER2_LIQUID[i - 1]!;
        expect(r.kva).toBeGreaterThan(prev.kva);
        expect(r.pkW).toBeGreaterThan(prev.pkW);
        expect(r.p0W).toBeGreaterThan(prev.p0W);
      }
    });
  });
  it('every row is returned exactly at its own rating', () => {
    for (const r of EU_TIER2_LIQUID) {
      expect(euMaximumLoss(r.kva, 'pk')).toBe(r.pkW);
      expect(euMaximumLoss(r.kva, 'p0')).toBe(r.p0W);
    }
  });
  it('the "≤ 25" row holds from 5 kVA; between rows the limit is interpolated', () => {
    expect(euMaximumLoss(10, 'pk')).toBe(600);
    expect(euMaximumLoss(750, 'p0')).toBeCloseTo(540 + ((585 - 540) * 120) / 170, 12);
  });
  it('below 5 kVA and above 3150 kVA there is no row', () => {
    expect(() => euMaximumLoss(3, 'pk')).toThrow(NotInTableError);
    expect(() => euMaximumLoss(4000, 'pk')).toThrow(/peak efficiency index/);
  });
});

describe('meetsEfficiencyRule', () => {
  // 500 kVA three-phase liquid-immersed: DOE 2016 99.35 % at 50 %; EU Tier 2 P0 459 W, Pk 3900 W.
  it('a unit well inside both rules passes each and both', () => {
    // 50 % load: 250 kW out, 400 + 0.25 × 3600 = 1300 W lost → 99.48 %
    expect(meetsEfficiencyRule(500, 400, 3600, 'DOE', 'liquid', 3, 2016, undefined)).toBe(true);
    expect(meetsEfficiencyRule(500, 400, 3600, 'EU', 'liquid', 3, 2016, undefined)).toBe(true);
    expect(meetsEfficiencyRule(500, 400, 3600, 'both', 'liquid', 3, 2016, undefined, 400, 3600)).toBe(true);
  });
  it('a unit that meets the DOE efficiency but exceeds the EU no-load limit fails "EU" and "both"', () => {
    // 520 + 0.25 × 3000 = 1270 W lost → 99.49 % ≥ 99.35 %; but P0 520 W > 459 W
    expect(meetsEfficiencyRule(500, 520, 3000, 'DOE', 'liquid', 3, 2016, undefined)).toBe(true);
    expect(meetsEfficiencyRule(500, 520, 3000, 'EU', 'liquid', 3, 2016, undefined)).toBe(false);
    expect(meetsEfficiencyRule(500, 520, 3000, 'both', 'liquid', 3, 2016, undefined, 520, 3000)).toBe(false);
  });
  it('the boundary: exactly the minimum efficiency passes, a watt more loss fails', () => {
    // η = 250 000 / (250 000 + L) = 0.9935 → L = 250 000 × 0.0065 / 0.9935
    const lost = (250000 * (1 - 0.9935)) / 0.9935;
    expect(meetsEfficiencyRule(500, lost - 1e-6, 0, 'DOE', 'liquid', 3, 2016, undefined)).toBe(true);
    expect(meetsEfficiencyRule(500, lost + 1, 0, 'DOE', 'liquid', 3, 2016, undefined)).toBe(false);
  });
  it('low-voltage dry-type is judged at 35 % load', () => {
    // 300 kVA LV dry-type 2016: 99.02 % at 35 %: 105 kW out; P0 600, Pk 4000 → 600 + 0.1225 × 4000 = 1090 W → 98.97 %
    expect(meetsEfficiencyRule(300, 600, 4000, 'DOE', 'lvdry', 3, 2016, undefined)).toBe(false);
    expect(meetsEfficiencyRule(300, 500, 3000, 'DOE', 'lvdry', 3, 2016, undefined)).toBe(true);
  });
  it('the EU table has no row for single-phase or dry-type units', () => {
    expect(() => meetsEfficiencyRule(50, 100, 600, 'EU', 'liquid', 1, 2016, undefined)).toThrow(NotInTableError);
    expect(() => meetsEfficiencyRule(500, 400, 3600, 'both', 'lvdry', 3, 2016, undefined, 400, 3600)).toThrow(/three-phase liquid/);
  });
});
