import { baseImpedance, parallelShare, percentReactance, percentResistance, voltageRegulation } from '../../core/voltageRegulation';
import { impedance, kva, pk, resistance, volts } from '../arguments';
import { bool, inGroup, num, series } from '../declaration';

const { block, each } = inGroup('Regulation and impedance');

export const RPCT = each({
  name: 'RPCT',
  help: 'Per-unit resistance from the load loss: pk_w / (kva × 1000); shows as a percentage (%R = Pk / (10 × kVA)).',
  source: '%R = Pk / (10·kVA), Pk in W (common practice)',
  args: [pk, kva],
  result: { type: 'number', unit: 'fraction' },
  compute: percentResistance,
});

export const XPCT = each({
  name: 'XPCT',
  help: 'Per-unit reactance from impedance and resistance: √(z² − r²).',
  source: 'impedance triangle, X = √(Z² − R²) (common practice)',
  args: [
    impedance,
    resistance,
  ],
  result: { type: 'number', unit: 'fraction' },
  compute: percentReactance,
});

export const REG = each({
  name: 'REG',
  help: 'Voltage regulation, exact phasor form with the secondary held at rated voltage: |1 + load·(cos φ ∓ j sin φ)(r + jx)| − 1. Negative when a leading load raises the voltage.',
  source: 'phasor diagram of the series-impedance model, secondary at rated voltage (textbook standard)',
  args: [
    resistance,
    num('x', 'fraction', 'Per-unit reactance, e.g. 5.65% (see XPCT).', 0.0565),
    num('load', 'per unit', 'Load as a fraction of rated current; 1 = full load.', 1),
    num('pf', 'power factor', 'Load power factor, 0 to 1.', 0.85),
    bool('leading', 'TRUE for a leading (capacitive) load; FALSE or blank for lagging.', false, { default: false }),
  ],
  result: { type: 'number', unit: 'fraction' },
  compute: voltageRegulation,
});

export const ZBASE = each({
  name: 'ZBASE',
  help: 'Base impedance in ohms: v² / (kva × 1000); multiply a per-unit impedance by it to get ohms.',
  source: 'Z_base = V² / S (common practice)',
  args: [volts, kva],
  result: { type: 'number', unit: 'Ω' },
  compute: baseImpedance,
});

export const SHARE = block({
  name: 'SHARE',
  help: 'Spills how units in parallel share a load, in proportion to kVA / z: one row per unit, columns share (kVA) | per-unit loading | overloaded (TRUE above 1). Assumes equal ratios and similar X/R.',
  source: 'parallel operation, load divides inversely as the impedances in ohms (common practice)',
  args: [
    series('kvas', 'kVA', 'Ratings of the units in parallel, one per unit.', [1000, 750]),
    series('zs', 'fraction', 'Impedance of each unit on its own rating: one value for all, or one per unit.', [0.0575, 0.05]),
    num('load_kva', 'kVA', 'Total load the units carry together.', 1500),
  ],
  result: { type: 'number', unit: 'kVA | per unit | TRUE/FALSE', columns: ['share (kVA)', 'loading (per unit)', 'overloaded'] },
  compute: parallelShare,
});
