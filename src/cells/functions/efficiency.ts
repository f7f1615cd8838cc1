import { efficiencyAt, efficiencyCurve, maxEfficiency, maxEfficiencyLoad, peakEfficiencyIndex } from '../../core/efficiency';
import { kva, load, losses, pf } from '../arguments';
import { inGroup, num } from '../declaration';

const { block, each } = inGroup('Efficiency');

export const EFF = each({
  name: 'EFF',
  help: 'Efficiency at a per-unit load and power factor: output / (output + p0_w + pk_w × load²).',
  source: 'η = P_out / (P_out + P0 + x²·Pk) (textbook standard)',
  args: [kva, ...losses, load, pf],
  result: { type: 'number', unit: 'fraction' },
  compute: efficiencyAt,
});

export const EFFMAXLOAD = each({
  name: 'EFFMAXLOAD',
  help: 'Per-unit load at which efficiency is highest, where load loss equals no-load loss: √(p0_w / pk_w).',
  source: 'textbook standard',
  args: [...losses],
  result: { type: 'number', unit: 'per unit' },
  compute: maxEfficiencyLoad,
});

export const EFFMAX = each({
  name: 'EFFMAX',
  help: 'The highest efficiency the unit reaches, at load √(p0_w / pk_w).',
  source: 'textbook standard',
  args: [kva, ...losses, pf],
  result: { type: 'number', unit: 'fraction' },
  compute: maxEfficiency,
});

export const EFFCURVE = block({
  name: 'EFFCURVE',
  help: 'Spills an efficiency curve: one row per load step from 0 to max_load, columns load | efficiency | total losses (W).',
  source: 'textbook standard',
  args: [
    kva,
    ...losses,
    pf,
    num('points', 'rows', 'Number of rows, 2 to 1001.', 11, { default: 11 }),
    num('max_load', 'per unit', 'Highest load of the curve.', 1.25, { default: 1.25 }),
  ],
  result: { type: 'number', unit: 'per unit | fraction | W', columns: ['load (per unit)', 'efficiency', 'total losses (W)'] },
  compute: efficiencyCurve,
});

export const PEI = each({
  name: 'PEI',
  help: 'Peak efficiency index: 1 − 2(P0 + Pc0) / (Sr·√((P0 + Pc0)/Pk)), with Pc0 the cooling power at no load.',
  source: 'EU Regulation 548/2014 Annex I (from memory)',
  args: [kva, ...losses, num('pc0_w', 'W', 'Power the cooling draws at no load; 0 for ONAN.', 0, { default: 0 })],
  result: { type: 'number', unit: 'fraction' },
  compute: peakEfficiencyIndex,
});
