/**
 * Arguments that more than one cell function takes, declared once so that a name has one help
 * text, one unit and one default everywhere. A function that needs another sample for its worked
 * example takes `withSample(arg, value)`; anything else different is a different argument and
 * gets its own name.
 */
import type { ConductorMaterial, LossStandard } from '../core/losses';
import type { Cooling, Paper, ThermalMethod } from '../core/thermal';
import { type Arg, type ArgValue, choice, num, series } from './declaration';

/** The same argument with another sample value for a function's worked example. */
export function withSample<V extends ArgValue>(arg: Arg<V>, sample: Arg<V>['sample']): Arg<V> {
  return { ...arg, sample };
}

/** A choice that may be left blank without a default: compute then receives undefined. */
export function blankable<T extends string>(arg: Arg<T>): Arg<T | undefined> {
  return { ...arg, optional: true };
}

// Nameplate and test report.
export const kva = num('kva', 'kVA', 'Nameplate rating.', 1000);
export const p0 = num('p0_w', 'W', 'No-load (core) loss, from the test report or the offer.', 1400);
export const pk = num('pk_w', 'W', 'Load loss at rated current, at reference temperature, from the test report or the offer.', 10500);
/** The two losses of a test report or offer, no-load then load: a function that takes p0_w takes pk_w after it. */
export const losses = [p0, pk] as const;
export const phases = num('phases', 'phases', '1 or 3.', 3, { default: 3 });
export const volts = num('v', 'V', 'Voltage, line-to-line for three-phase.', 480);
export const impedance = num('z', 'fraction', 'Impedance as a percentage of the rating, e.g. 5.75%.', 0.0575);
export const resistance = num('r', 'fraction', 'Per-unit resistance, e.g. 1.05% (see RPCT).', 0.0105);
export const sourceMva = num('source_mva', 'MVA', 'Short-circuit power of the supply; blank for an infinite source.', 500, { optional: true });

// Loading.
export const load = num('load', 'per unit', 'Load as a fraction of nameplate kVA; 1 = full load, 50% = half load.', 0.5);
export const pf = num('pf', 'power factor', 'Load power factor, 0 to 1.', 1, { default: 1 });
export const loads = series('loads', 'per unit', 'Loading profile: one per-unit load (kVA / nameplate kVA) per step, e.g. 8,760 hourly values.', [
  0.3, 0.35, 0.6, 0.9, 1.0, 0.7,
]);
export const stepHours = series('hours', 'h', 'Length of each step: one value for every step or one per step.', [4], { default: 1 });
export const ambient = num('ambient_c', '°C', 'Ambient temperature, -60 to 60 °C.', 30);

// Thermal model.
export const cooling = choice(
  'cooling',
  'Cooling mode: "ONAN", "ONAF", "OFAF" (or "OF"), "ODAF" (or "OD"); sets the exponents, time constants and rated rises. The loading functions also take the block XFMR.HEATRUN spills here, with the unit\'s own heat-run data.',
  { options: ['ONAN', 'ONAF', 'OF', 'OD'] as const satisfies readonly Cooling[], aliases: { OFAF: 'OF', OFWF: 'OF', ODAF: 'OD', ODWF: 'OD' }, default: 'ONAN' },
);
export const thermalMethod = choice(
  'method',
  '"IEEE" (C57.91 clause 7, default), "IEC" (60076-7; ONAN takes the distribution-transformer row, the other coolings the power-transformer rows) or "IEC-POWER" (60076-7 power-transformer rows for every cooling, ONAN included).',
  { options: ['IEEE', 'IEC', 'IEC-POWER'] as const satisfies readonly ThermalMethod[], default: 'IEEE' },
);
export const paper = choice(
  'paper',
  '"upgraded" (thermally upgraded paper, rate 1 at 110 °C, the default) or "normal" (kraft paper, rate 1 at 98 °C).',
  {
    options: ['upgraded', 'normal'] as const satisfies readonly Paper[],
    aliases: { 'thermally upgraded': 'upgraded', TU: 'upgraded', kraft: 'normal', 'non upgraded': 'normal', 'not upgraded': 'normal' },
    default: 'upgraded',
  },
);

// Efficiency regulations.
export const doeKind = choice(
  'kind',
  'Kind of unit: "liquid", "submersible", "lvdry" (low-voltage dry-type) or "mvdry" (medium-voltage dry-type).',
  { options: ['liquid', 'submersible', 'lvdry', 'mvdry'], default: 'liquid' },
);
export const doeLevels = num('levels', 'year', 'DOE levels: 2016 for units made from 1 January 2016; 2029 for units made from 23 April 2029.', 2016, {
  default: 2016,
});
export const bil = num('bil_kv', 'kV', 'Basic impulse level of the high-voltage winding; needed for "mvdry" only.', 95, { optional: true });
/** What picks the DOE table a unit falls in, in the order DOEMIN and COMPLIES take it after kva. */
export const doeTable = [doeKind, phases, doeLevels, bil] as const;

// Winding conductor and the standard whose temperature constant applies (losses, test reports).
export const material = choice('material', 'Winding conductor: "Cu" or "Al".', {
  options: ['Cu', 'Al'] as const satisfies readonly ConductorMaterial[],
  aliases: { copper: 'Cu', aluminium: 'Al', aluminum: 'Al' },
  default: 'Cu',
});
export const lossStandard = choice('standard', '"IEEE" (copper Tk 234.5) or "IEC" (copper Tk 235); aluminium is 225 in both.', {
  options: ['IEEE', 'IEC'] as const satisfies readonly LossStandard[],
  default: 'IEEE',
});
/** Conductor and standard, which together fix the temperature constant Tk of a correction to another temperature. */
export const temperatureConstant = [material, lossStandard] as const;

// A load loss measured at one winding temperature and moved to another (LOSSTEMP, ZCORR).
export const measuredAt = num('from_c', '°C', 'Winding temperature at which pk_w was measured.', 25);
export const referenceTemperature = num('to_c', '°C', 'Reference temperature wanted: 85 °C (IEEE, 65 °C rise), 75 °C (IEC), 55 °C (US DOE, liquid-immersed).', 85);
export const i2rPart = num('i2r_w', 'W', 'The I²R part of pk_w at from_c (measured resistance × current²); needed when to_c is below from_c, blank otherwise treats all of pk_w as I²R.', 9000, {
  optional: true,
});
