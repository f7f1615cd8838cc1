import {
  agingAccelerationFactor,
  equivalentAging,
  hotSpotProfile,
  hotSpotSteady,
  lifeUsedHours,
  maxLoadForHotSpot,
  relativeAgingRate,
} from '../../core/thermal';
import { ambient, cooling, load, loads, paper, thermalMethod, withSample } from '../arguments';
import { block, each, num, series } from '../declaration';

const GROUP = 'Loading and aging';
const SOURCE = 'IEEE C57.91 clause 7; IEC 60076-7 clause 8 and Table 4 (from memory)';

const topOilRise = num('top_oil_rise', 'K', "Top-oil rise over ambient at rated load (test report); blank takes the cooling mode's table value.", 55, {
  optional: true,
});
const hsGradient = num('hs_gradient', 'K', "Hot-spot rise over top oil at rated load (test report); blank takes the table value.", 25, {
  optional: true,
});
const lossRatio = num('loss_ratio', 'ratio', 'Load loss at rated current ÷ no-load loss; blank takes the table value.', 5, { optional: true });
const hotspot = num('hotspot_c', '°C', 'Winding hot-spot temperature, -60 to 250 °C.', 120);
const profileLoads = withSample(loads, [0.6, 0.7, 0.9, 1.2, 1.3, 1.1, 0.8, 0.6]);
const ambients = series('ambients', '°C', 'Ambient temperature: one value for the whole profile or one per step, -60 to 60 °C.', [25]);
const hours = num('hours', 'h', 'Length of every step of the profile.', 1, { default: 1 });
const thermalArgs = [cooling, topOilRise, hsGradient, lossRatio, thermalMethod] as const;
const profileArgs = [profileLoads, ambients, hours, ...thermalArgs] as const;

export const HOTSPOT = each({
  name: 'HOTSPOT',
  group: GROUP,
  help: 'Steady-state winding hot-spot temperature at a constant load: ambient + top-oil rise × [(load² × R + 1)/(R + 1)]^n + hot-spot gradient × load^(2m).',
  source: SOURCE,
  args: [
    withSample(load, 1),
    ambient,
    ...thermalArgs,
  ],
  result: { type: 'number', unit: '°C' },
  compute: hotSpotSteady,
});

export const FAA = each({
  name: 'FAA',
  group: GROUP,
  help: 'Aging acceleration factor of thermally upgraded paper: exp(15000/383 − 15000/(hotspot_c + 273)); 1 at 110 °C, about 2 for every 6 to 7 K above.',
  source: 'IEEE C57.91 clause 5 (from memory)',
  args: [hotspot],
  result: { type: 'number', unit: 'per unit of normal aging' },
  compute: agingAccelerationFactor,
});

export const AGERATE = each({
  name: 'AGERATE',
  group: GROUP,
  help: 'Relative aging rate of the insulation paper: for "upgraded" paper the aging acceleration factor (1 at 110 °C); for "normal" kraft paper 2^((hotspot_c − 98)/6) (1 at 98 °C, doubling every 6 K).',
  source: 'IEC 60076-7 relative aging rate; IEEE C57.91 clause 5 (from memory)',
  args: [hotspot, paper],
  result: { type: 'number', unit: 'per unit of normal aging' },
  compute: relativeAgingRate,
});

export const HOTSPOTS = block({
  name: 'HOTSPOTS',
  group: GROUP,
  help: 'Spills the hot-spot temperature over a loading profile, one row per step (the value at the end of the step), for a chart. Starts from the steady state of the first load; each step solved exactly for its load and ambient.',
  source: SOURCE,
  args: profileArgs,
  result: { type: 'number', unit: '°C', columns: ['hot-spot (°C)'] },
  compute: (...a: Parameters<typeof hotSpotProfile>) => Array.from(hotSpotProfile(...a), (t) => [t]),
});

export const FEQA = each({
  name: 'FEQA',
  group: GROUP,
  help: 'Equivalent aging factor over a loading profile: Σ aging rate × hours ÷ Σ hours; 1 means the insulation aged as fast as at the reference hot-spot (110 °C upgraded paper, 98 °C normal).',
  source: `${SOURCE}; IEEE C57.91 clause 5 equivalent aging (from memory)`,
  args: [...profileArgs, paper],
  result: { type: 'number', unit: 'per unit of normal aging' },
  compute: equivalentAging,
});

export const LIFEUSED = each({
  name: 'LIFEUSED',
  group: GROUP,
  help: 'Insulation life consumed over a loading profile, in hours of normal aging (Σ aging rate × hours). Divide by the normal life for a fraction: 180,000 h for thermally upgraded paper at 110 °C (IEEE C57.91 / IEC 60076-7 normal-life table).',
  source: `${SOURCE}; IEEE C57.91 clause 5 loss of life (from memory)`,
  args: [...profileArgs, paper],
  result: { type: 'number', unit: 'h' },
  compute: lifeUsedHours,
});

export const MAXLOAD = each({
  name: 'MAXLOAD',
  group: GROUP,
  help: 'Largest constant per-unit load whose steady hot-spot reaches limit_c at this ambient (the root of the HOTSPOT equation). #NUM! when even no load reaches the limit.',
  source: SOURCE,
  args: [
    ambient,
    num('limit_c', '°C', 'Hot-spot limit, 60 to 200 °C: 110 °C is rated for upgraded paper (IEEE), 98 °C for normal paper (IEC).', 110, { default: 110 }),
    ...thermalArgs,
  ],
  result: { type: 'number', unit: 'per unit' },
  compute: maxLoadForHotSpot,
});
