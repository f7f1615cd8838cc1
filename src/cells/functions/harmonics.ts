import { harmonicDerating, harmonicLossFactor, kFactor, type SpectrumBasis } from '../../core/harmonics';
import { choice, inGroup, num, series } from '../declaration';

const { each } = inGroup('Losses');
const orders = series('orders', 'order', 'Harmonic orders, 1 for the fundamental, e.g. 1, 5, 7, 11, 13.', [1, 5, 7, 11, 13]);

export const HLF = each({
  name: 'HLF',
  help: 'Harmonic loss factor: Σ (I_h·h)² / Σ I_h², the winding eddy loss of the spectrum per unit of that of a sine of the same rms. Currents in any one unit.',
  source: 'IEEE C57.110 harmonic loss factor F_HL',
  args: [orders, series('currents', 'A or per unit', 'Current at each order, one per order, in any one unit (A, % of fundamental...).', [100, 20, 14, 9.1, 7.7])],
  result: { type: 'number', unit: 'factor' },
  compute: harmonicLossFactor,
});

export const KFACTOR = each({
  name: 'KFACTOR',
  help: 'K-factor: Σ (I_h·h)² with each current per unit of the transformer’s rated current (basis "rated", the default). A spectrum in per cent of the fundamental, as meters report it, needs basis "fundamental": it is then scaled to the rated rms current, and K equals HLF.',
  source: 'UL 1561/1562 K-factor definition',
  args: [
    orders,
    series('currents', 'per unit', 'Current at each order: per unit of rated current (basis "rated"), or of the fundamental (basis "fundamental").', [0.96, 0.19, 0.13, 0.087, 0.074]),
    choice('basis', '"rated": currents per unit of rated current; "fundamental": per unit or per cent of the fundamental.', {
      options: ['rated', 'fundamental'] as const satisfies readonly SpectrumBasis[],
      default: 'rated',
    }),
  ],
  result: { type: 'number', unit: 'factor' },
  compute: kFactor,
});

export const HDERATE = each({
  name: 'HDERATE',
  help: 'Largest per-unit load current with that harmonic content: √((1 + eddy_pu) / (1 + hlf × eddy_pu)).',
  source: 'IEEE C57.110 maximum non-sinusoidal current, dry-type method (from memory)',
  args: [
    num('hlf', 'factor', 'Harmonic loss factor of the load current (HLF), 1 or more.', 8.35),
    num('eddy_pu', 'per unit', 'Winding eddy loss at rated current per unit of the rated I²R loss, e.g. 8%.', 0.08),
  ],
  result: { type: 'number', unit: 'per unit' },
  compute: harmonicDerating,
});
