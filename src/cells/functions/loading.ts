import { cyclicMax, GAS_BUBBLE_CAUTION_C, loadingLimits, profileCheck, weightedAmbient, type LoadingCategory, type ThermalMethod, type UnitSize } from '../../core/thermal';
import { thermalMethod } from '../arguments';
import { inGroup, series } from '../declaration';
import { BEYOND_NAMEPLATE, category, checkArgs, GROUP, modelOf, size, type CoolingArg } from './thermalArguments';

const { block, each } = inGroup(GROUP);

type Check = [
  loads: Float64Array,
  ambients: Float64Array,
  hours: number,
  category: LoadingCategory,
  size: UnitSize,
  cooling: CoolingArg,
  topOilRise: number | undefined,
  hsGradient: number | undefined,
  lossRatio: number | undefined,
  method: ThermalMethod | undefined,
];

const LIMITS_SOURCE = 'IEEE C57.91 loading categories; IEC 60076-7:2005 Table 4 (both from memory; docs/references.md)';

function checked(...[l, a, h, cat, sz, c, top, gradient, ratio, m]: Check) {
  const unit = modelOf(c, m, { topOilRise: top, hotSpotGradient: gradient, lossRatio: ratio });
  return { unit, report: profileCheck(unit, l, a, h, cat, sz) };
}

export const LOADLIMITS = block({
  name: 'LOADLIMITS',
  help: `Spills the limits a loading category allows — top-oil, hot-spot, load per unit, whether normal aging (F_EQA ≤ 1) is also required — with the guide's name for it, the ${GAS_BUBBLE_CAUTION_C} °C gas-bubble caution and the source. IEEE C57.91 categories for method "IEEE", IEC 60076-7 for "IEC"/"IEC-POWER". ${BEYOND_NAMEPLATE}`,
  source: LIMITS_SOURCE,
  args: [category, size, thermalMethod],
  result: { type: 'text', unit: 'label and value', columns: ['limit', 'value'] },
  compute: (cat, sz, m) => {
    const l = loadingLimits(m === 'IEEE' ? 'IEEE' : 'IEC', cat, sz);
    const given = (v: number | null) => (v === null ? 'not given' : v);
    return [
      ['category', `${l.guide === 'IEEE' ? 'IEEE C57.91' : 'IEC 60076-7'} ${l.name} (${l.size})`],
      ['top-oil limit (°C)', given(l.topOilC)],
      ['hot-spot limit (°C)', given(l.hotSpotC)],
      ['load limit (per unit)', given(l.loadPerUnit)],
      ['normal aging required (F_EQA ≤ 1)', l.agingBudget],
      ['gas-bubble caution above (°C)', GAS_BUBBLE_CAUTION_C],
      ['source', l.source],
    ];
  },
});

export const LOADOK = each({
  name: 'LOADOK',
  help: `TRUE when a loading profile stays within the category's limits at every step — load, top-oil and hot-spot at each step's end — and, for normal loading, ages no faster than normal over the profile (F_EQA ≤ 1). ${BEYOND_NAMEPLATE}`,
  source: LIMITS_SOURCE,
  args: checkArgs,
  result: { type: 'boolean', unit: 'TRUE/FALSE' },
  compute: (...a: Check) => checked(...a).report.withinLimits,
});

export const LOADCHECK = block({
  name: 'LOADCHECK',
  help: `Spills a short report of a loading profile against a category: peak top-oil, hot-spot and load with their steps (1 = the first), F_EQA, life used in hours and as a fraction of the normal life, the first limit exceeded and its step ("none"), the verdict of XFMR.LOADOK and whether the hot-spot passes the ${GAS_BUBBLE_CAUTION_C} °C gas-bubble caution. ${BEYOND_NAMEPLATE}`,
  source: LIMITS_SOURCE,
  args: checkArgs,
  result: { type: 'text', unit: 'label and value', columns: ['quantity', 'value'] },
  compute: (...a: Check) => {
    const { report: r } = checked(...a);
    return [
      ['category', `${r.limits.guide === 'IEEE' ? 'IEEE C57.91' : 'IEC 60076-7'} ${r.limits.name} (${r.limits.size})`],
      ['peak top-oil (°C)', r.peakTopOil],
      ['at step', r.peakTopOilStep],
      ['peak hot-spot (°C)', r.peakHotSpot],
      ['at step', r.peakHotSpotStep],
      ['peak load (per unit)', r.peakLoad],
      ['at step', r.peakLoadStep],
      ['F_EQA', r.equivalentAging],
      ['life used (h)', r.lifeUsedHours],
      ['life used (fraction of normal life)', r.lifeFraction],
      ['first limit exceeded', r.firstExceeded ?? 'none'],
      ['at step', r.firstExceeded === null ? 'none' : r.firstExceededStep === 0 ? 'whole profile' : r.firstExceededStep],
      ['within limits', r.withinLimits],
      [`hot-spot above ${GAS_BUBBLE_CAUTION_C} °C (gas bubbles)`, r.aboveGasBubbleCaution],
    ];
  },
});

export const CYCLICMAX = each({
  name: 'CYCLICMAX',
  help: `The largest factor by which the whole loading profile can be multiplied and still pass XFMR.LOADOK — how much more load the unit can take on the same cycle. Two root searches (temperatures, then aging): 7 to 12 runs of the profile as a rule, never more than 40, an 8,760-hour year included. #NUM! when even no load passes. ${BEYOND_NAMEPLATE}`,
  source: LIMITS_SOURCE,
  args: checkArgs,
  result: { type: 'number', unit: 'factor on the profile' },
  compute: (...[l, a, h, cat, sz, c, top, gradient, ratio, m]: Check) =>
    cyclicMax(modelOf(c, m, { topOilRise: top, hotSpotGradient: gradient, lossRatio: ratio }), l, a, h, cat, sz).factor,
});

export const AMBIENTW = each({
  name: 'AMBIENTW',
  help: 'Weighted ambient temperature of IEC 60076-7 from the twelve monthly mean temperatures: yearly mean + 0.01 × [2 × (hottest month − yearly mean)]^1.85, the constant ambient that ages the insulation as the year does. Give it as the ambients of a profile function (one cell is a constant ambient).',
  source: 'IEC 60076-7 weighted ambient temperature (from memory)',
  args: [series('monthly_means', '°C', 'The twelve monthly mean ambient temperatures of the year, January to December.', [-2, -1, 3, 8, 13, 17, 19, 18, 14, 9, 4, 0])],
  result: { type: 'number', unit: '°C' },
  compute: weightedAmbient,
});
