/**
 * Loading categories and their limits, and the checks of a profile against them.
 *
 * IEEE C57.91 (clause 9 and its table of suggested temperature limits for loading above nameplate,
 * from memory — no stored copy of the table could be read): four categories with a top-oil limit
 * and a limit on the insulated-conductor hot-spot, and the guide's ceiling of 2 per unit load:
 *   normal life expectancy           105 °C top oil, 120 °C hot-spot, normal aging (F_EQA ≤ 1)
 *   planned loading beyond nameplate 110 °C, 130 °C
 *   long-time emergency              110 °C, 140 °C
 *   short-time emergency             110 °C, 180 °C
 * IEC 60076-7:2005 Table 4, current and temperature limits applicable to loading beyond nameplate
 * rating (from memory), by transformer size (distribution up to 2,500 kVA three-phase; medium power
 * up to 100 MVA; large power above):
 *   normal cyclic          1.5 / 1.5 / 1.3 pu, 105 °C top oil, 120 °C hot-spot, normal aging
 *   long-time emergency    1.8 / 1.5 / 1.3 pu, 115 °C, 140 °C
 *   short-time emergency   2.0 / 1.8 / 1.5 pu, 115 °C, 160 °C (no temperatures for distribution)
 * Both guides warn that above about 140 °C hot-spot, gas bubbles may form in the insulation, more
 * readily in wet paper, and lower the dielectric strength: the gas-bubble caution of every report.
 *
 * Loading beyond nameplate is a planning estimate: the manufacturer's data, the owner's practice
 * and local codes govern, and a qualified engineer verifies it.
 */
import { InputError, NoAnswerError, shown } from '../errors';
import { lifeFraction } from './aging';
import type { ThermalCharacteristics } from './coolingTable';
import { MAX_THERMAL_LOAD } from './steadyState';
import { runProfile } from './transient';

export type LoadingCategory = 'normal' | 'planned' | 'long-time emergency' | 'short-time emergency';
export const LOADING_CATEGORIES: readonly LoadingCategory[] = ['normal', 'planned', 'long-time emergency', 'short-time emergency'];

export type UnitSize = 'distribution' | 'medium power' | 'large power';
export const UNIT_SIZES: readonly UnitSize[] = ['distribution', 'medium power', 'large power'];

/** Which guide's categories apply: IEEE C57.91 for the IEEE method, IEC 60076-7 for both IEC ones. */
export type LoadingGuide = 'IEEE' | 'IEC';

export interface LoadingLimits {
  readonly guide: LoadingGuide;
  readonly category: LoadingCategory;
  readonly size: UnitSize;
  /** The guide's own name for the category. */
  readonly name: string;
  /** °C; null where the guide gives none. */
  readonly topOilC: number | null;
  readonly hotSpotC: number | null;
  /** Per unit of rated current; null where the guide gives none. */
  readonly loadPerUnit: number | null;
  /** Whether the profile must also age no faster than normal (F_EQA ≤ 1). */
  readonly agingBudget: boolean;
  readonly source: string;
}

/** Hot-spot above which both guides warn of gas bubbles in the insulation, °C (from memory). */
export const GAS_BUBBLE_CAUTION_C = 140;

const IEEE_SOURCE = 'IEEE C57.91 suggested limits for loading above nameplate (from memory)';
const IEC_SOURCE = 'IEC 60076-7:2005 Table 4 (from memory)';

const IEEE_LIMITS: Readonly<Record<LoadingCategory, Omit<LoadingLimits, 'guide' | 'category' | 'size' | 'source'>>> = {
  normal: { name: 'normal life expectancy loading', topOilC: 105, hotSpotC: 120, loadPerUnit: 2, agingBudget: true },
  planned: { name: 'planned loading beyond nameplate rating', topOilC: 110, hotSpotC: 130, loadPerUnit: 2, agingBudget: false },
  'long-time emergency': { name: 'long-time emergency loading', topOilC: 110, hotSpotC: 140, loadPerUnit: 2, agingBudget: false },
  'short-time emergency': { name: 'short-time emergency loading', topOilC: 110, hotSpotC: 180, loadPerUnit: 2, agingBudget: false },
};

/** IEC 60076-7 Table 4: per category, [top oil, hot-spot] and the current by size. */
const IEC_LIMITS: Readonly<Record<Exclude<LoadingCategory, 'planned'>, { name: string; top: number; hot: number; current: Record<UnitSize, number>; budget: boolean }>> = {
  normal: { name: 'normal cyclic loading', top: 105, hot: 120, current: { distribution: 1.5, 'medium power': 1.5, 'large power': 1.3 }, budget: true },
  'long-time emergency': { name: 'long-time emergency loading', top: 115, hot: 140, current: { distribution: 1.8, 'medium power': 1.5, 'large power': 1.3 }, budget: false },
  'short-time emergency': { name: 'short-time emergency loading', top: 115, hot: 160, current: { distribution: 2.0, 'medium power': 1.8, 'large power': 1.5 }, budget: false },
};

/** The limits of a category for a guide and unit size. */
export function loadingLimits(guide: LoadingGuide, category: LoadingCategory, size: UnitSize): LoadingLimits {
  if (guide === 'IEEE') {
    const note = size === 'distribution' ? '' : '; the same limits for power transformers';
    return { guide, category, size, ...IEEE_LIMITS[category], source: IEEE_SOURCE + note };
  }
  if (category === 'planned') {
    throw new InputError('category', 'IEC 60076-7 has no planned-loading category; use "normal", "long-time emergency" or "short-time emergency" (or method "IEEE")');
  }
  const row = IEC_LIMITS[category];
  const shortDistribution = category === 'short-time emergency' && size === 'distribution';
  return {
    guide,
    category,
    size,
    name: row.name,
    topOilC: shortDistribution ? null : row.top,
    hotSpotC: shortDistribution ? null : row.hot,
    loadPerUnit: row.current[size],
    agingBudget: row.budget,
    source: `${IEC_SOURCE}, ${size} transformers${shortDistribution ? ' (the table gives no temperature limits here)' : ''}`,
  };
}

export function guideOf(m: ThermalCharacteristics): LoadingGuide {
  return m.method === 'IEEE' ? 'IEEE' : 'IEC';
}

/** Margins below which a value counts as at its limit, not above it: LOADOK of a CYCLICMAX result holds. */
const TEMPERATURE_TOLERANCE_K = 1e-6;
const RELATIVE_TOLERANCE = 1e-9;

export interface ProfileCheck {
  readonly limits: LoadingLimits;
  readonly peakTopOil: number;
  /** 1-based steps, as a sheet counts rows. */
  readonly peakTopOilStep: number;
  readonly peakHotSpot: number;
  readonly peakHotSpotStep: number;
  readonly peakLoad: number;
  readonly peakLoadStep: number;
  readonly equivalentAging: number;
  readonly lifeUsedHours: number;
  readonly lifeFraction: number;
  /** The first limit exceeded ("hot-spot 120 °C", "normal aging"...) or null. */
  readonly firstExceeded: string | null;
  /** Its 1-based step; 0 for the aging budget, which belongs to the whole profile. */
  readonly firstExceededStep: number;
  readonly withinLimits: boolean;
  /** The peak hot-spot is above the 140 °C gas-bubble caution. */
  readonly aboveGasBubbleCaution: boolean;
}

/** A checked profile against a category's limits: the report of LOADCHECK and the verdict of LOADOK. */
export function checkProfileLimits(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, limits: LoadingLimits): ProfileCheck {
  const n = loads.length;
  const hot = new Float64Array(n);
  const oil = new Float64Array(n);
  const run = runProfile(m, loads, ambients, stepHours, { paper: m.paper, hotSpots: hot, topOils: oil });
  let peakLoad = -Infinity;
  let peakLoadStep = 0;
  let first: string | null = null;
  let firstStep = 0;
  const loadLimit = limits.loadPerUnit === null ? Infinity : limits.loadPerUnit * (1 + RELATIVE_TOLERANCE);
  const oilLimit = limits.topOilC === null ? Infinity : limits.topOilC + TEMPERATURE_TOLERANCE_K;
  const hotLimit = limits.hotSpotC === null ? Infinity : limits.hotSpotC + TEMPERATURE_TOLERANCE_K;
  for (let i = 0; i < n; i++) {
    const k = loads[i]!;
    if (k > peakLoad) {
      peakLoad = k;
      peakLoadStep = i;
    }
    if (first === null) {
      const over: string[] = [];
      if (k > loadLimit) over.push(`load ${shown(limits.loadPerUnit!)} per unit`);
      if (oil[i]! > oilLimit) over.push(`top-oil ${shown(limits.topOilC!)} °C`);
      if (hot[i]! > hotLimit) over.push(`hot-spot ${shown(limits.hotSpotC!)} °C`);
      if (over.length > 0) {
        first = over.join(' and ');
        firstStep = i + 1;
      }
    }
  }
  const equivalentAging = run.agingHours / (n * stepHours);
  if (first === null && limits.agingBudget && equivalentAging > 1 + RELATIVE_TOLERANCE) {
    first = `normal aging (F_EQA ${shown(equivalentAging)} > 1)`;
    firstStep = 0;
  }
  return {
    limits,
    peakTopOil: run.peakTopOil,
    peakTopOilStep: run.peakTopOilStep + 1,
    peakHotSpot: run.peakHotSpot,
    peakHotSpotStep: run.peakHotSpotStep + 1,
    peakLoad,
    peakLoadStep: peakLoadStep + 1,
    equivalentAging,
    lifeUsedHours: run.agingHours,
    lifeFraction: lifeFraction(run.agingHours, m.normalLifeHours),
    firstExceeded: first,
    firstExceededStep: firstStep,
    withinLimits: first === null,
    aboveGasBubbleCaution: run.peakHotSpot > GAS_BUBBLE_CAUTION_C,
  };
}

export interface CyclicCapability {
  /** The largest factor on every load of the profile that keeps it within the category. */
  readonly factor: number;
  /** How many times the whole profile was run. */
  readonly evaluations: number;
  /** What bounds it: the load limit, or the temperatures and aging. */
  readonly boundBy: 'load' | 'temperature or aging';
}

/** The relative width of the final bracket: far inside the 1 % the invariant asks of the answer. */
const FACTOR_TOLERANCE = 1e-6;
/** The search never runs the profile more than this many times. */
export const CYCLIC_MAX_EVALUATIONS = 40;

/**
 * The root of an increasing margin g(f) between lo (g ≤ 0) and hi (g > 0), to FACTOR_TOLERANCE:
 * Illinois false position in q = f² — temperatures rise about as the square of the load. A convex
 * margin is approached from one side only, so when an end moves by less than 1e-3 of itself the
 * search probes just past it (half the tolerance) to close the bracket from the other side; an
 * interpolation that moves neither end that far and fails to halve the bracket is followed by a
 * bisection. Returns the lower end, where g ≤ 0.
 */
function rootBelow(g: (f: number) => number, lo: number, gLo: number, hi: number, gHi: number, budget: () => boolean): number {
  let side = 0;
  const take = (f: number, v: number): number => {
    const moved = v <= 0 ? f - lo : hi - f;
    if (v <= 0) {
      lo = f;
      gLo = v;
      if (side === -1) gHi *= 0.5;
      side = -1;
    } else {
      hi = f;
      gHi = v;
      if (side === 1) gLo *= 0.5;
      side = 1;
    }
    return moved;
  };
  const open = () => hi - lo > FACTOR_TOLERANCE * hi && budget();
  while (open()) {
    const width = hi - lo;
    const qLo = lo * lo;
    const qHi = hi * hi;
    let q = (qLo * gHi - qHi * gLo) / (gHi - gLo);
    if (!(q > qLo && q < qHi)) q = 0.5 * (qLo + qHi);
    const landedHigh = g(Math.sqrt(q));
    const moved = take(Math.sqrt(q), landedHigh);
    if (!open()) break;
    if (moved < 1e-3 * hi) {
      // Converging on one end: probe just past it.
      const probe = landedHigh > 0 ? hi * (1 - 0.5 * FACTOR_TOLERANCE) : lo * (1 + 0.5 * FACTOR_TOLERANCE);
      if (probe > lo && probe < hi) take(probe, g(probe));
    } else if (hi - lo > 0.5 * width) {
      const mid = 0.5 * (lo + hi);
      take(mid, g(mid));
      side = 0;
    }
  }
  return lo;
}

/**
 * CYCLICMAX: the largest factor f with the profile f·K within the category. Every temperature of
 * the profile rises with f, and so does the aging, so the answer is the smallest of three roots,
 * capped by the load limit over the peak load. Two searches, each by rootBelow:
 *  1. the temperatures, h(f) = max(peak top-oil − limit, peak hot-spot − limit), on runs of the
 *     profile without the aging quadrature (a fifth of the cost): a run at the cap, one at f = 1
 *     (or half the cap), one at 0 when needed, then the interpolation — 8 to 14 runs as a rule;
 *  2. with an aging budget, the aging at that factor, and only if it exceeds normal aging the root
 *     of 10·ln F_EQA below it — 6 to 10 more runs.
 * Never more than 40 runs in all. The lower end of each bracket is returned, so LOADOK of f·K holds.
 */
export function cyclicCapability(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, limits: LoadingLimits): CyclicCapability {
  let peak = 0;
  for (let i = 0; i < loads.length; i++) if (loads[i]! > peak) peak = loads[i]!;
  if (peak === 0) throw new NoAnswerError('the profile carries no load: any factor keeps it within the limits');
  const cap = Math.min(limits.loadPerUnit ?? MAX_THERMAL_LOAD, MAX_THERMAL_LOAD) / peak;
  const hours = loads.length * stepHours;
  let evaluations = 0;
  const budget = () => evaluations < CYCLIC_MAX_EVALUATIONS;
  const temperature = (f: number): number => {
    evaluations++;
    const run = runProfile(m, loads, ambients, stepHours, { scale: f });
    let h = -Infinity;
    if (limits.topOilC !== null) h = Math.max(h, run.peakTopOil - limits.topOilC);
    if (limits.hotSpotC !== null) h = Math.max(h, run.peakHotSpot - limits.hotSpotC);
    return h;
  };
  const aging = (f: number): number => {
    evaluations++;
    return 10 * Math.log(runProfile(m, loads, ambients, stepHours, { scale: f, paper: m.paper }).agingHours / hours);
  };
  // The root of g below `upper`, where g(upper) > 0: bracketed by f = 1 (or half of upper), else by 0.
  const rootUnder = (g: (f: number) => number, upper: number, atUpper: number): number => {
    const first = Math.min(1, 0.5 * upper);
    const atFirst = g(first);
    if (atFirst <= 0) return rootBelow(g, first, atFirst, upper, atUpper, budget);
    const atZero = g(0);
    if (atZero > 0) {
      throw new NoAnswerError('even with no load the profile is not within the limits: the ambient alone takes the top oil or the aging past them');
    }
    return rootBelow(g, 0, atZero, first, atFirst, budget);
  };

  let factor = cap;
  let boundBy: CyclicCapability['boundBy'] = 'load';
  const atCap = temperature(cap);
  if (atCap > 0) {
    boundBy = 'temperature or aging';
    factor = rootUnder(temperature, cap, atCap);
  }
  if (limits.agingBudget) {
    const atFactor = aging(factor);
    if (atFactor > 0) {
      boundBy = 'temperature or aging';
      factor = rootUnder(aging, factor, atFactor);
    }
  }
  return { factor, evaluations, boundBy };
}
