/**
 * Losses. No-load (core) loss P0 is taken as constant with load; load (winding) loss Pk at rated
 * current scales with the square of the per-unit load (common practice).
 */
import { InputError, shown } from './errors';
import { anyNumber, nonNegative, perUnitImpedance, perUnitLoad, positive } from './guards';

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

/** R(to_c) / R(from_c) = (Tk + to_c)/(Tk + from_c), each temperature checked against its argument. */
function resistanceRatio(fromC: number, toC: number, material: ConductorMaterial, standard: LossStandard): number {
  const tk = temperatureConstant(material, standard);
  const from = celsiusAboveAbsoluteOfResistance('from_c', fromC, tk);
  const to = celsiusAboveAbsoluteOfResistance('to_c', toC, tk);
  return (tk + to) / (tk + from);
}

/**
 * Load loss measured at `fromC` moved to `toC` (IEEE C57.12.90 load-loss clause; IEC 60076-1
 * clause 11.4, both from memory): the I²R part grows with resistance, f = (Tk + to)/(Tk + from);
 * the stray and eddy part falls inversely: P(to) = I²R·f + (Pk − I²R)/f.
 *
 * Without the I²R part the answer depends on the split, and the blank case takes the split that
 * gives the largest corrected loss, so the unit never looks better than it is. Going hotter
 * (f > 1) P(to) grows with I²R, so the largest value treats the whole loss as I²R: Pk·f. Going
 * cooler (f < 1) it would be the whole loss as stray, Pk/f — a loss above the measured one, which
 * is no estimate at all — so a blank I²R part is refused there and the message asks for it.
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
  const factor = resistanceRatio(fromC, toC, material, standard);
  if (i2rWatts === undefined) {
    if (factor < 1) {
      throw new InputError(
        'i2r_w',
        `is blank; correcting from ${shown(fromC)} °C down to ${shown(toC)} °C needs the I²R part of pk_w (measured resistance × current²): taking all of pk_w as I²R would understate the loss`,
      );
    }
    return pk * factor;
  }
  const i2r = nonNegative('i2r_w', i2rWatts);
  if (i2r > pk) throw new InputError('i2r_w', `the I²R part (${shown(i2r)} W) cannot exceed the whole load loss pk_w (${shown(pk)} W)`);
  return i2r * factor + (pk - i2r) / factor;
}

/**
 * Winding resistance measured at `fromC` moved to `toC`: R(to) = R(from)·(Tk + to)/(Tk + from)
 * (IEEE C57.12.90 resistance-measurement clause; IEC 60076-1 clause 11.2, both from memory).
 */
export function resistanceAtTemperature(ohms: number, fromC: number, toC: number, material: ConductorMaterial, standard: LossStandard): number {
  const r = positive('r_ohm', ohms);
  return r * resistanceRatio(fromC, toC, material, standard);
}

/**
 * Impedance measured at `fromC` moved to the reference temperature `toC`, the way IEEE
 * C57.12.90 does it (from memory): only the resistive part changes with temperature. With the
 * load loss Pk measured at `fromC`, the resistive part is r = Pk / (kVA·1000) per unit; the
 * reactive part x = √(z² − r²) stays; the loss is moved to `toC` as LOSSTEMP moves it, and
 * z(to) = √(x² + r(to)²). After z and kva come LOSSTEMP's own arguments (pkWatts, fromC, toC,
 * i2rWatts, material, standard), passed on unchanged.
 */
export function impedanceAtTemperature(z: number, kva: number, ...loss: Parameters<typeof loadLossAtTemperature>): number {
  const [pkWatts] = loss;
  const zm = perUnitImpedance('z', z);
  const s = positive('kva', kva) * 1000;
  const rm = nonNegative('pk_w', pkWatts) / s;
  if (rm >= zm) {
    throw new InputError('pk_w', `${shown(pkWatts)} W is ${shown(rm * 100)} % of the rating, not less than the impedance z (${shown(zm * 100)} %); check pk_w and kva`);
  }
  const x2 = zm * zm - rm * rm;
  const rt = loadLossAtTemperature(...loss) / s;
  return Math.sqrt(x2 + rt * rt);
}

// A conductor temperature at or below −Tk would make the resistance zero or negative.
function celsiusAboveAbsoluteOfResistance(name: string, celsius: number, tk: number): number {
  anyNumber(name, celsius);
  if (!(celsius > -tk)) throw new InputError(name, `must be above ${-tk} °C for this conductor`);
  if (celsius > 1000) throw new InputError(name, `${shown(celsius)} °C is beyond any winding temperature`);
  return celsius;
}
