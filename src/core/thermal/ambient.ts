/**
 * The weighted ambient temperature of IEC 60076-7 (clause on ambient temperature, from memory):
 * for a year described by its twelve monthly mean temperatures, the constant ambient that would
 * age the insulation as much as the year does,
 *   θE = θya + 0.01 · [2 · (θma,max − θya)]^1.85
 * with θya the yearly mean (of the monthly means) and θma,max the mean of the hottest month. The
 * tests compare it with the aging-equivalent mean of the 6 K doubling law it approximates.
 */
import { InputError } from '../errors';
import { ambientTemperature, eachOf } from '../guards';

export function weightedAmbient(monthlyMeans: Float64Array): number {
  if (monthlyMeans.length !== 12) {
    throw new InputError('monthly_means', `has ${monthlyMeans.length} values; give the twelve monthly mean temperatures of the year`);
  }
  eachOf('monthly_means', monthlyMeans, ambientTemperature);
  let sum = 0;
  let hottest = -Infinity;
  for (const t of monthlyMeans) {
    sum += t;
    if (t > hottest) hottest = t;
  }
  const yearly = sum / 12;
  return yearly + 0.01 * Math.pow(2 * (hottest - yearly), 1.85);
}
