/**
 * Cost of losses and total owning cost.
 *
 * A watt of loss held for a year costs price_kwh × hours / 1000; over an evaluation period of n
 * years at interest (discount) rate i, the present worth of that yearly cost is the annuity factor
 *   PW(i, n) = (1 − (1 + i)^−n) / i        (= n when i = 0: no discounting, a plain sum)
 * — the present worth of a level annuity (common practice; the same factor as a spreadsheet's
 * PV(i, n, −1), which the reference tests check against @formulajs/formulajs).
 *
 *   A = price_kwh × hours / 1000 × PW(i, n)                          money per W of no-load loss
 *   B = price_kwh × hours / 1000 × PW(i, n) × LsF × peak_load²        money per W of rated load loss
 *
 * No-load loss P0 flows whenever the unit is energised, so A needs the hours energised a year.
 * Load loss at peak is Pk·peak², and its yearly mean is that times the loss factor LsF (mean of
 * load² over peak²), which is how B carries the loading (loss capitalisation as manufacturers and
 * utilities state it — see the worked example cited in test/reference/cost.reference.test.ts).
 * TOC = price + A·P0 + B·Pk (total owning cost; common practice).
 *
 * Rate and years have no default: an evaluation period and a discount rate are the buyer's own
 * policy (utilities use anything from a few years to the unit's life, and rates of a few per cent
 * upward), and a silent default would put a number on a bid sheet that nobody chose.
 */
import { energyLost } from './energy';
import { atMostOne, fractionBelowOne, integerBetween, nonNegative, perUnitLoad, positiveAtMost } from './guards';

/** Hours in a leap year: the most a unit can be energised in one year. */
const MAX_HOURS_A_YEAR = 8784;
const MAX_YEARS = 100;

/** Present worth of 1 a year for `years` years at `rate`: (1 − (1 + i)^−n) / i, or n at i = 0. */
export function presentWorthFactor(rate: number, years: number): number {
  const i = fractionBelowOne('rate', rate);
  const n = integerBetween('years', years, 1, MAX_YEARS);
  if (i === 0) return n;
  // 1 − (1 + i)^−n written with expm1/log1p so that a very small rate keeps its precision.
  return -Math.expm1(-n * Math.log1p(i)) / i;
}

/** Present worth of the energy one watt loses over the period: price × hours/1000 × PW. */
function presentWorthPerWatt(priceKwh: number, rate: number, years: number, hours: number): number {
  const price = nonNegative('price_kwh', priceKwh);
  const h = positiveAtMost('hours', hours, MAX_HOURS_A_YEAR);
  return ((price * h) / 1000) * presentWorthFactor(rate, years);
}

/**
 * The yearly cost of one watt of peak demand: a demand (capacity) charge in money per kW a year,
 * as utilities evaluating losses add it to the energy term (IEEE C57.120, from memory: the
 * system-capacity cost beside the energy cost). A watt of no-load loss is always present at the
 * system peak; a watt of rated load loss is there as (responsibility × peak_load)², where the
 * responsibility factor is the unit's load at the system peak over its own peak load — squared
 * because load loss goes with current squared (common practice). An evaluation that states a
 * responsibility factor for the losses themselves (already squared) is given as its square root.
 */
function demandWorthPerWatt(demandCharge: number, rate: number, years: number): number {
  const d = nonNegative('demand_kw_year', demandCharge);
  return d === 0 ? 0 : (d / 1000) * presentWorthFactor(rate, years);
}

/** A: the present worth of one watt of no-load loss (money per W). */
export function noLoadLossWorth(priceKwh: number, rate: number, years: number, hours: number, demandCharge = 0): number {
  return presentWorthPerWatt(priceKwh, rate, years, hours) + demandWorthPerWatt(demandCharge, rate, years);
}

/** B: the present worth of one watt of rated load loss (money per W) at that loss factor and peak. */
export function loadLossWorth(
  priceKwh: number,
  lossFactor: number,
  peakLoad: number,
  rate: number,
  years: number,
  hours: number,
  demandCharge = 0,
  responsibility = 1,
): number {
  const lsf = atMostOne('loss_factor', lossFactor);
  const peak = perUnitLoad('peak_load', peakLoad);
  const rf = atMostOne('responsibility', responsibility);
  const energy = presentWorthPerWatt(priceKwh, rate, years, hours) * lsf;
  const demand = demandWorthPerWatt(demandCharge, rate, years) * rf * rf;
  return (energy + demand) * peak * peak;
}

/** Total owning cost: purchase price plus the capitalised no-load and load losses. */
export function totalOwningCost(price: number, p0Watts: number, pkWatts: number, a: number, b: number): number {
  return (
    nonNegative('price', price) +
    nonNegative('a', a) * nonNegative('p0_w', p0Watts) +
    nonNegative('b', b) * nonNegative('pk_w', pkWatts)
  );
}

/** Cost of the energy lost over a loading profile: kWh lost × price (not discounted). */
export function lossEnergyCost(p0Watts: number, pkWatts: number, loads: Float64Array, priceKwh: number, hours: Float64Array): number {
  const price = nonNegative('price_kwh', priceKwh);
  return energyLost(p0Watts, pkWatts, loads, hours) * price;
}
