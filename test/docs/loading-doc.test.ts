import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { THERMAL_ROWS } from '../../src/core/thermal';

const doc = readFileSync('docs/loading.md', 'utf8');

describe('docs/loading.md', () => {
  it('lists every table row with the values the code uses', () => {
    for (const r of THERMAL_ROWS) {
      const which = r.method === 'IEEE' ? `IEEE ${r.cooling}` : r.unit === 'distribution' ? 'IEC ONAN (distribution)' : `IEC ${r.cooling} (power)${r.cooling === 'ONAN' ? ', IEC-POWER ONAN' : ''}`;
      const line = `| ${which} | ${r.oilExponent} | ${r.windingExponent / 2} | ${r.lossRatio} | ${r.oilTimeConstant} | ${r.windingTimeConstant} | ${r.topOilRise} | ${r.hotSpotGradient} | ${r.k11} / ${r.k21} / ${r.k22} | ${r.paper} |`;
      expect(doc, which).toContain(line);
    }
  });

  it('carries the beyond-nameplate caution', () => {
    expect(doc).toMatch(/manufacturer's data, the owner's practice and local codes govern/);
  });
});
