/**
 * Loading and aging of oil-immersed transformers (IEEE C57.91 clause 7; IEC 60076-7): temperatures
 * in steady state, after a load step and over a profile, insulation aging and life consumed, the
 * loading categories' limits, and the largest load for a limit. Every function takes the unit's
 * thermal characteristics as one value (thermalModel: a table row with the unit's own data); the
 * cell layer builds it from the cooling name or a heat-run block.
 */
import { lifeFraction, referenceHotSpot } from './aging';
import { type Cooling, type Paper, type ThermalCharacteristics, type ThermalMethod } from './coolingTable';
import { checkProfileLimits, cyclicCapability, guideOf, loadingLimits, type LoadingCategory, type ProfileCheck, type UnitSize } from './limits';
import { thermalModel, type ThermalData } from './steadyState';
import { checkProfile, runProfile } from './transient';

export * from './aging';
export * from './ambient';
export * from './coolingTable';
export * from './limits';
export * from './steadyState';
export * from './step';
export * from './transient';

/** Checked profile → end-of-step hot-spot series, °C. */
export function hotSpotProfile(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number): Float64Array {
  checkProfile(loads, ambients, stepHours);
  const out = new Float64Array(loads.length);
  runProfile(m, loads, ambients, stepHours, { hotSpots: out });
  return out;
}

/** Checked profile → end-of-step top-oil series, °C. */
export function topOilProfile(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number): Float64Array {
  checkProfile(loads, ambients, stepHours);
  const out = new Float64Array(loads.length);
  runProfile(m, loads, ambients, stepHours, { topOils: out });
  return out;
}

/** Life consumed over a checked profile, hours at the paper's reference hot-spot (aging integrated within each step). */
export function lifeUsedHours(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, paper: Paper = m.paper): number {
  checkProfile(loads, ambients, stepHours);
  return runProfile(m, loads, ambients, stepHours, { paper }).agingHours;
}

/** F_EQA over a checked profile: Σ ∫V dt / Σ Δt. */
export function equivalentAging(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, paper: Paper = m.paper): number {
  return lifeUsedHours(m, loads, ambients, stepHours, paper) / (loads.length * stepHours);
}

/** LOADCHECK / LOADOK: a checked profile against a category's limits for the model's guide. */
export function profileCheck(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, category: LoadingCategory, size: UnitSize): ProfileCheck {
  const limits = loadingLimits(guideOf(m), category, size);
  checkProfile(loads, ambients, stepHours);
  return checkProfileLimits(m, loads, ambients, stepHours, limits);
}

/** CYCLICMAX: the largest factor on the whole checked profile that keeps it within the category. */
export function cyclicMax(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number, category: LoadingCategory, size: UnitSize) {
  const limits = loadingLimits(guideOf(m), category, size);
  checkProfile(loads, ambients, stepHours);
  return cyclicCapability(m, loads, ambients, stepHours, limits);
}

export interface LoadingYearOptions {
  /** Step length, h (default 1). */
  readonly stepHours?: number;
  readonly cooling?: Cooling;
  readonly method?: ThermalMethod;
  /** The unit's own thermal data (heat-run report, loss ratio, paper...); absent: the table's. */
  readonly data?: ThermalData;
}

export interface LoadingYear {
  /** End-of-step hot-spot temperature, °C, one per step. */
  readonly hotSpots: Float64Array;
  /** End-of-step top-oil temperature, °C, one per step. */
  readonly topOils: Float64Array;
  readonly peakHotSpot: number;
  /** F_EQA over the profile. */
  readonly equivalentAging: number;
  /** Life consumed, hours at the reference hot-spot. */
  readonly lifeUsedHours: number;
  /** lifeUsedHours over the paper's normal life. */
  readonly lifeFraction: number;
  readonly normalLifeHours: number;
  readonly paper: Paper;
  readonly referenceHotSpot: number;
  /** The thermal characteristics used, with their source. */
  readonly model: ThermalCharacteristics;
}

/** One unit over a profile (a year of 8,760 hourly loads, or any count): everything at once. */
export function loadingYear(loads: Float64Array, ambients: Float64Array, options: LoadingYearOptions = {}): LoadingYear {
  const stepHours = options.stepHours ?? 1;
  const model = thermalModel(options.method ?? 'IEEE', options.cooling ?? 'ONAN', options.data);
  checkProfile(loads, ambients, stepHours);
  const hotSpots = new Float64Array(loads.length);
  const topOils = new Float64Array(loads.length);
  const run = runProfile(model, loads, ambients, stepHours, { paper: model.paper, hotSpots, topOils });
  return {
    hotSpots,
    topOils,
    peakHotSpot: run.peakHotSpot,
    equivalentAging: run.agingHours / (stepHours * loads.length),
    lifeUsedHours: run.agingHours,
    lifeFraction: lifeFraction(run.agingHours, model.normalLifeHours),
    normalLifeHours: model.normalLifeHours,
    paper: model.paper,
    referenceHotSpot: referenceHotSpot(model.paper),
    model,
  };
}

