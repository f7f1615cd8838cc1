import { allDayEfficiency, energyDelivered, energyLost, loadFactor, lossFactor, lossFactorEstimate } from '../../core/energy';
import { kva, loads, losses, stepHours as hours } from '../arguments';
import { inGroup, num, series } from '../declaration';

const { each } = inGroup('All-day energy');
const pfs = series('pfs', 'power factor', 'Power factor: one value for the whole profile or one per step.', [0.9], { default: 1 });

export const ALLDAY = each({
  name: 'ALLDAY',
  help: 'All-day (energy) efficiency over a loading profile: kWh out / (kWh out + kWh lost).',
  source: 'all-day efficiency (textbook standard)',
  args: [kva, ...losses, loads, pfs, hours],
  result: { type: 'number', unit: 'fraction' },
  compute: allDayEfficiency,
});

export const ELOSS = each({
  name: 'ELOSS',
  help: 'Energy lost in the unit over a loading profile: Σ (p0_w + pk_w × load²) × hours / 1000.',
  source: 'common practice',
  args: [...losses, loads, hours],
  result: { type: 'number', unit: 'kWh' },
  compute: energyLost,
});

export const EOUT = each({
  name: 'EOUT',
  help: 'Energy delivered over a loading profile: Σ load × kva × pf × hours.',
  source: 'common practice',
  args: [kva, loads, pfs, hours],
  result: { type: 'number', unit: 'kWh' },
  compute: energyDelivered,
});

/** A factor of a profile of equal steps, from its loads alone: LOADFACTOR and LOSSFACTOR. */
const profileFactor = (name: string, help: string, factor: (loads: Float64Array) => number) =>
  each({
    name,
    help,
    source: 'common practice',
    args: [loads],
    result: { type: 'number', unit: 'fraction' },
    compute: factor,
  });

export const LOADFACTOR = profileFactor('LOADFACTOR', 'Load factor of a profile of equal steps: mean load / peak load.', loadFactor);

export const LOSSFACTOR = profileFactor('LOSSFACTOR', 'Loss factor of a profile of equal steps, exact: mean of load² / peak load².', lossFactor);

export const LSF = each({
  name: 'LSF',
  help: 'Loss factor estimated from the load factor: k × LF + (1 − k) × LF²; k about 0.3, lower (0.15–0.2) for peaky loads.',
  source: 'empirical loss-factor relation (common practice; usually credited to Buller and Woodrow, from memory)',
  args: [
    num('load_factor', 'fraction', 'Load factor, 0 to 1.', 0.6),
    num('k', 'fraction', 'Weighting, 0 to 1.', 0.3, { default: 0.3 }),
  ],
  result: { type: 'number', unit: 'fraction' },
  compute: lossFactorEstimate,
});
