/**
 * Loading and aging of oil-immersed transformers (IEEE C57.91 clause 7; IEC 60076-7): hot-spot
 * temperature in steady state and over a profile, insulation aging, life consumed, and the
 * largest steady load for a hot-spot limit. Cooling, method and paper arrive as
 * their typed unions; the cell declarations parse the text a user types.
 */
import { agingRateSum, type Paper } from './aging';
import type { Cooling, ThermalCharacteristics, ThermalMethod } from './coolingTable';
import { maxSteadyLoad, steadyHotSpot, thermalModel } from './steadyState';
import { checkProfile, hotSpotSeriesInto } from './transient';

export * from './aging';
export * from './coolingTable';
export * from './steadyState';
export * from './transient';

/** Steady-state hot-spot temperature, °C. */
export function hotSpotSteady(
  load: number,
  ambientC: number,
  cooling: Cooling,
  topOilRise: number | undefined,
  hotSpotGradient: number | undefined,
  lossRatio: number | undefined,
  method: ThermalMethod,
): number {
  return steadyHotSpot(thermalModel(cooling, method, topOilRise, hotSpotGradient, lossRatio), load, ambientC);
}

/** Largest steady per-unit load whose hot-spot reaches limit_c. */
export function maxLoadForHotSpot(
  ambientC: number,
  limitC: number,
  cooling: Cooling,
  topOilRise: number | undefined,
  hotSpotGradient: number | undefined,
  lossRatio: number | undefined,
  method: ThermalMethod,
): number {
  return maxSteadyLoad(thermalModel(cooling, method, topOilRise, hotSpotGradient, lossRatio), ambientC, limitC);
}

/** Checked profile → end-of-step hot-spot series, °C. */
function profileHotSpots(m: ThermalCharacteristics, loads: Float64Array, ambients: Float64Array, stepHours: number): Float64Array {
  checkProfile(loads, ambients, stepHours);
  return hotSpotSeriesInto(m, loads, ambients, stepHours, new Float64Array(loads.length));
}

/** The transient hot-spot series, one value per step, °C. */
export function hotSpotProfile(
  loads: Float64Array,
  ambients: Float64Array,
  stepHours: number,
  cooling: Cooling,
  topOilRise: number | undefined,
  hotSpotGradient: number | undefined,
  lossRatio: number | undefined,
  method: ThermalMethod,
): Float64Array {
  return profileHotSpots(thermalModel(cooling, method, topOilRise, hotSpotGradient, lossRatio), loads, ambients, stepHours);
}

/** The arguments of equivalentAging and lifeUsedHours: those of hotSpotProfile, then the paper kind. */
type AgingArgs = [...Parameters<typeof hotSpotProfile>, paper: Paper];

/** Σ V over the profile's end-of-step hot-spots, for the paper named last. */
function agingSum(args: AgingArgs): number {
  const [loads, ambients, stepHours, cooling, topOilRise, hotSpotGradient, lossRatio, method, paper] = args;
  const hotSpots = hotSpotProfile(loads, ambients, stepHours, cooling, topOilRise, hotSpotGradient, lossRatio, method);
  return agingRateSum(hotSpots, paper);
}

/** Equivalent aging factor over the profile, Σ V·Δt / Σ Δt (equal steps: the mean rate). */
export function equivalentAging(...args: AgingArgs): number {
  return agingSum(args) / args[0].length;
}

/** Insulation life consumed over the profile, Σ V·Δt, hours at the reference hot-spot. */
export function lifeUsedHours(...args: AgingArgs): number {
  return agingSum(args) * args[2];
}
