import {
  agingAccelerationFactor,
  equivalentAging,
  hotSpotAfterStep,
  hotSpotProfile,
  lifeUsedHours,
  maxSteadyLoad,
  overloadTime,
  relativeAgingRate,
  steadyHotSpot,
  steadyTopOil,
  topOilProfile,
} from '../../core/thermal';
import { cooling as sharedCooling, load as sharedLoad, paper as sharedPaper, thermalMethod, withSample } from '../arguments';
import { inGroup, num } from '../declaration';
import {
  ambient,
  BEYOND_NAMEPLATE,
  cooling,
  GROUP,
  heatRunBlock,
  hsGradient,
  lossRatio,
  method,
  modelOf,
  paper,
  paperOf,
  profileArgs,
  SOURCE,
  tauOil,
  tauWinding,
  thermalArgs,
  topOilRise,
  type CoolingArg,
} from './thermalArguments';
import type { Paper, ThermalMethod } from '../../core/thermal';

const { block, each } = inGroup(GROUP);

const hotspot = num('hotspot_c', '°C', 'Winding hot-spot temperature, -60 to 250 °C.', 120);
const load = withSample(sharedLoad, 1);
const loadBefore = num('load_before', 'per unit', 'Load the unit has carried long enough to settle, before the step (kVA ÷ nameplate kVA).', 0.6);
const loadAfter = num('load_after', 'per unit', 'Load from the step on.', 1.3);

type Model = [cooling: CoolingArg, topOilRise: number | undefined, hsGradient: number | undefined, lossRatio: number | undefined, method: ThermalMethod | undefined];
const model = (...[c, top, gradient, ratio, m]: Model) => modelOf(c, m, { topOilRise: top, hotSpotGradient: gradient, lossRatio: ratio });

export const HOTSPOT = each({
  name: 'HOTSPOT',
  help: 'Steady-state winding hot-spot temperature at a constant load: ambient + top-oil rise × [(load² × R + 1)/(R + 1)]^n + hot-spot gradient × load^(2m).',
  source: SOURCE,
  args: [load, ambient, ...thermalArgs],
  result: { type: 'number', unit: '°C' },
  compute: (k: number, a: number, ...m: Model) => steadyHotSpot(model(...m), k, a),
});

export const TOPOIL = each({
  name: 'TOPOIL',
  help: 'Steady-state top-oil temperature at a constant load: ambient + top-oil rise × [(load² × R + 1)/(R + 1)]^n. With the hot-spot gradient × load^(2m) it makes XFMR.HOTSPOT.',
  source: SOURCE,
  args: [load, ambient, cooling, topOilRise, lossRatio, method],
  result: { type: 'number', unit: '°C' },
  compute: (k: number, a: number, c: CoolingArg, top: number | undefined, ratio: number | undefined, m: ThermalMethod | undefined) => steadyTopOil(modelOf(c, m, { topOilRise: top, lossRatio: ratio }), k, a),
});

const stepModel = (
  c: CoolingArg,
  top: number | undefined,
  gradient: number | undefined,
  ratio: number | undefined,
  tauO: number | undefined,
  tauW: number | undefined,
  m: ThermalMethod | undefined,
) =>
  modelOf(c, m, { topOilRise: top, hotSpotGradient: gradient, lossRatio: ratio, oilTimeConstant: tauO, windingTimeConstant: tauW });
const stepArgs = [cooling, topOilRise, hsGradient, lossRatio, tauOil, tauWinding, method] as const;
type StepModel = Parameters<typeof stepModel>;

export const HOTSPOTSTEP = each({
  name: 'HOTSPOTSTEP',
  help: `Hot-spot temperature \`hours\` after the load steps from load_before (settled) to load_after at a constant ambient: the step-load check of the loading guides (IEEE C57.91 clause 7 exponentials with its top-oil time constant for n ≠ 1; the IEC 60076-7 equations for the IEC methods). ${BEYOND_NAMEPLATE}`,
  source: `${SOURCE}; IEEE C57.91 clause 7 top-oil time constant (from memory)`,
  args: [loadBefore, loadAfter, num('hours', 'h', 'Time since the step, 0 or more.', 4), ambient, ...stepArgs],
  result: { type: 'number', unit: '°C' },
  compute: (k1: number, k2: number, h: number, a: number, ...m: StepModel) => hotSpotAfterStep(stepModel(...m), k1, k2, h, a),
});

export const OVERLOADTIME = each({
  name: 'OVERLOADTIME',
  help: `Hours after a step from load_before (settled) to load_after until the hot-spot first reaches limit_c; 0 when it is there from the start; #NUM! with the temperature it settles at when it never gets there. A root search on the closed-form step response: 60 to 75 evaluations for a crossing within a day, at most about 110. ${BEYOND_NAMEPLATE}`,
  source: `${SOURCE}; IEEE C57.91 clause 7 top-oil time constant (from memory)`,
  args: [
    loadBefore,
    loadAfter,
    ambient,
    num('limit_c', '°C', 'Hot-spot limit, 60 to 200 °C and above ambient_c: 120 °C (default) for normal loading, 140 °C long-time emergency, 180 °C IEEE short-time emergency.', 140, { default: 120 }),
    ...stepArgs,
  ],
  result: { type: 'number', unit: 'h' },
  compute: (k1: number, k2: number, a: number, limit: number, ...m: StepModel) => overloadTime(stepModel(...m), k1, k2, a, limit).hours,
});

export const FAA = each({
  name: 'FAA',
  help: 'Aging acceleration factor of thermally upgraded paper: exp(15000/383 − 15000/(hotspot_c + 273)); 1 at 110 °C, about 2 for every 6 to 7 K above.',
  source: 'IEEE C57.91 clause 5 (from memory)',
  args: [hotspot],
  result: { type: 'number', unit: 'per unit of normal aging' },
  compute: agingAccelerationFactor,
});

export const AGERATE = each({
  name: 'AGERATE',
  help: 'Relative aging rate of the insulation paper: for "upgraded" paper the aging acceleration factor (1 at 110 °C); for "normal" kraft paper 2^((hotspot_c − 98)/6) (1 at 98 °C, doubling every 6 K).',
  source: 'IEC 60076-7 relative aging rate; IEEE C57.91 clause 5 (from memory)',
  args: [hotspot, sharedPaper],
  result: { type: 'number', unit: 'per unit of normal aging' },
  compute: relativeAgingRate,
});

type Profile = [loads: Float64Array, ambients: Float64Array, hours: number, ...model: Model];

/** A block of one temperature over a loading profile, one row per step: HOTSPOTS and TOPOILS. */
const temperatureProfile = (name: string, help: string, column: string, profile: typeof hotSpotProfile) =>
  block({
    name,
      help,
    source: SOURCE,
    args: profileArgs,
    result: { type: 'number', unit: '°C', columns: [column] },
    compute: (l: Float64Array, a: Float64Array, h: number, ...m: Model) => Array.from(profile(model(...m), l, a, h), (t) => [t]),
  });

export const HOTSPOTS = temperatureProfile(
  'HOTSPOTS',
  'Spills the hot-spot temperature over a loading profile, one row per step (the value at the end of the step), for a chart beside XFMR.TOPOILS. Starts from the steady state of the first load; each step solved exactly for its load and ambient.',
  'hot-spot (°C)',
  hotSpotProfile,
);

export const TOPOILS = temperatureProfile(
  'TOPOILS',
  'Spills the top-oil temperature over a loading profile, one row per step (the value at the end of the step), with the same arguments as XFMR.HOTSPOTS so the two series chart side by side.',
  'top-oil (°C)',
  topOilProfile,
);

/**
 * An aging integral over a loading profile, with the unit's paper or its row's: FEQA and
 * LIFEUSED, the same integral per hour and in hours.
 */
const agingOverProfile = (name: string, help: string, clause5: string, resultUnit: string, f: typeof equivalentAging) =>
  each({
    name,
      help,
    source: `${SOURCE}; IEEE C57.91 clause 5 ${clause5} (from memory)`,
    args: [...profileArgs, paper],
    result: { type: 'number', unit: resultUnit },
    compute: (...[l, a, h, c, top, gradient, ratio, m, p]: [...Profile, paper: Paper | undefined]) => {
      const unit = model(c, top, gradient, ratio, m);
      return f(unit, l, a, h, paperOf(unit, p));
    },
  });

export const FEQA = agingOverProfile(
  'FEQA',
  'Equivalent aging factor over a loading profile: Σ ∫ aging rate dt ÷ Σ hours, the rate integrated along each step\'s hot-spot curve; 1 means the insulation aged as fast as at the paper\'s reference hot-spot (110 °C upgraded, 98 °C normal).',
  'equivalent aging',
  'per unit of normal aging',
  equivalentAging,
);

export const LIFEUSED = agingOverProfile(
  'LIFEUSED',
  "Insulation life consumed over a loading profile, in hours at the paper's reference hot-spot (Σ ∫ aging rate dt). Divide by the normal life for a fraction: 180,000 h (IEEE C57.91 / IEC 60076-7 normal-life table), or the heat-run block's figure.",
  'loss of life',
  'h',
  lifeUsedHours,
);

export const MAXLOAD = each({
  name: 'MAXLOAD',
  help: 'Largest constant per-unit load whose steady hot-spot reaches limit_c at this ambient (the root of the HOTSPOT equation). #NUM! when even no load reaches the limit.',
  source: SOURCE,
  args: [
    ambient,
    num('limit_c', '°C', 'Hot-spot limit, 60 to 200 °C: 110 °C is rated for upgraded paper (IEEE), 98 °C for normal paper (IEC).', 110, { default: 110 }),
    ...thermalArgs,
  ],
  result: { type: 'number', unit: 'per unit' },
  compute: (a: number, limit: number, ...m: Model) => maxSteadyLoad(model(...m), a, limit),
});

const opt = (name: string, unit: string, help: string, sample: number) => num(name, unit, help, sample, { optional: true });

export const HEATRUN = block({
  name: 'HEATRUN',
  help: "Spills a unit's thermal data as a labelled block of 14 rows — method, cooling, rated rises, loss ratio, time constants, exponents, k11 k21 k22, paper and normal life — with the table row's value wherever an argument is blank. Type a unit's heat-run report once here; give the block in place of the cooling name to every other thermal function.",
  source: `${SOURCE}; the unit's own data where given`,
  args: [
    sharedCooling,
    thermalMethod,
    topOilRise,
    hsGradient,
    opt('hs_factor', 'ratio', 'IEC hot-spot factor H from the heat-run report; when given, hs_gradient is read as the average winding gradient gr and the hot-spot gradient is H·gr.', 1.1),
    lossRatio,
    tauOil,
    tauWinding,
    opt('n', 'exponent', 'Oil exponent n (IEC x), 0.5 to 2.', 0.8),
    opt('m', 'exponent', 'Winding exponent m (IEC y/2): the hot-spot gradient goes as load^(2m).', 0.8),
    opt('k11', 'ratio', 'IEC thermal-model constant k11 (1 for IEEE).', 1),
    opt('k21', 'ratio', 'IEC thermal-model constant k21, 1 or more (1 for IEEE).', 1),
    opt('k22', 'ratio', 'IEC thermal-model constant k22 (1 for IEEE).', 1),
    paper,
    opt('normal_life_h', 'h', "Normal insulation life at the paper's reference hot-spot; blank: 180,000 h.", 180_000),
  ],
  result: { type: 'text', unit: 'label and value', columns: ['quantity', 'value'] },
  compute: (c, m, top, gradient, factor, ratio, tauO, tauW, n, mm, k11, k21, k22, p, life) => {
    const unit = modelOf(c, m, {
      topOilRise: top,
      hotSpotGradient: gradient,
      hotSpotFactor: factor,
      lossRatio: ratio,
      oilTimeConstant: tauO,
      windingTimeConstant: tauW,
      oilExponent: n,
      windingExponentM: mm,
      k11,
      k21,
      k22,
      paper: p,
      normalLifeHours: life,
    });
    return heatRunBlock(m, unit);
  },
});
