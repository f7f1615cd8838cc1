/**
 * Losses. No-load (core) loss P0 is taken as constant with load; load (winding) loss Pk at rated
 * current scales with the square of the per-unit load (common practice).
 */
import { InputError } from './errors';
import { anyNumber, nonNegative, perUnitLoad } from './guards';

export function loadLossAt(pkWatts: number, load: number): number {
  const x = perUnitLoad('load', load);
  return nonNegative('pk_w', pkWatts) * x * x;
}

export function totalLossesAt(p0Watts: number, pkWatts: number, load: number): number {
  return nonNegative('p0_w', p0Watts) + loadLossAt(pkWatts, load);
}

export type ConductorMaterial = 'Cu' | 'Al';
export type LossStandard = 'IEEE' | 'IEC';

/**
 * Temperature constant Tk of the conductor resistance, in °C: resistance is proportional to
 * Tk + θ. Copper 234.5 (IEEE C57.12.90, from memory) or 235 (IEC 60076-1, from memory);
 * aluminium 225 in both.
 */
export function temperatureConstant(material: ConductorMaterial, standard: LossStandard): number {
  if (material === 'Al') return 225;
  return standard === 'IEC' ? 235 : 234.5;
}

/**
 * Load loss measured at `fromC` moved to `toC` (IEEE C57.12.90 load-loss clause; IEC 60076-1
 * clause 11.4, both from memory): the I²R part grows with resistance, (Tk + to)/(Tk + from); the
 * stray and eddy part falls inversely. When the I²R part is not known the whole loss is treated
 * as I²R — the conservative reading when correcting to a hotter reference.
 */
export function loadLossAtTemperature(
  pkWatts: number,
  fromC: number,
  toC: number,
  i2rWatts: number | undefined,
  material: ConductorMaterial,
  standard: LossStandard,
): number {
  const pk = nonNegative('pk_w', pkWatts);
  const tk = temperatureConstant(material, standard);
  const from = celsiusAboveAbsoluteOfResistance('from_c', fromC, tk);
  const to = celsiusAboveAbsoluteOfResistance('to_c', toC, tk);
  const i2r = i2rWatts === undefined ? pk : nonNegative('i2r_w', i2rWatts);
  if (i2r > pk) throw new InputError('i2r_w', `the I²R part (${i2r} W) cannot exceed the whole load loss pk_w (${pk} W)`);
  const stray = pk - i2r;
  const factor = (tk + to) / (tk + from);
  return i2r * factor + stray / factor;
}

// A conductor temperature at or below −Tk would make the resistance zero or negative.
function celsiusAboveAbsoluteOfResistance(name: string, celsius: number, tk: number): number {
  anyNumber(name, celsius);
  if (!(celsius > -tk)) throw new InputError(name, `must be above ${-tk} °C for this conductor`);
  if (celsius > 1000) throw new InputError(name, `${celsius} °C is beyond any winding temperature`);
  return celsius;
}
