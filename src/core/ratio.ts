/**
 * Ratio and voltage: the ideal transformer (Vs/Vp = Ns/Np, Is/Ip = Np/Ns), winding turns ratio
 * by vector group, taps and the ratio test. Voltages are line-to-line for three-phase units.
 */
import { InputError, NoAnswerError, shown } from './errors';
import { anyNumber, fractionBelowOne, integerBetween, positive } from './guards';
import { parseVectorGroup, phaseDisplacement, windingVoltage } from './vectorGroup';

/**
 * Turns ratio HV:LV. Without a vector group, the voltage ratio (single-phase, or Yy/Dd where
 * line and winding ratios agree). With one, the ratio of the phase-winding voltages, e.g. Dyn11:
 * hv / (lv/√3).
 */
export function turnsRatio(hvVolts: number, lvVolts: number, vectorGroup?: string): number {
  const hv = positive('hv_v', hvVolts);
  const lv = positive('lv_v', lvVolts);
  if (vectorGroup === undefined) return hv / lv;
  const g = parseVectorGroup('vector_group', vectorGroup);
  return windingVoltage(g.hv, hv) / windingVoltage(g.lv, lv);
}

/** Ideal transformer output voltage: the input voltage scaled by turns_out / turns_in. */
export function idealOutputVoltage(inputVolts: number, turnsIn: number, turnsOut: number): number {
  return anyNumber('v_in', inputVolts) * (positive('turns_out', turnsOut) / positive('turns_in', turnsIn));
}

/** Ideal transformer output current: current goes the inverse way, scaled by turns_in / turns_out. */
export function idealOutputCurrent(inputAmps: number, turnsIn: number, turnsOut: number): number {
  return anyNumber('i_in', inputAmps) * (positive('turns_in', turnsIn) / positive('turns_out', turnsOut));
}

/** Voltage of a tapped winding: rated × (1 + step × position); position 0 is the principal tap. */
export function tapVoltage(ratedVolts: number, step: number, position: number): number {
  const rated = positive('rated_v', ratedVolts);
  const s = tapStep(step);
  const p = integerBetween('position', position, -99, 99);
  const factor = 1 + s * p;
  if (!(factor > 0)) {
    throw new InputError('position', `${p} steps of ${shown(s * 100)} % takes the winding to zero or below`);
  }
  return rated * factor;
}

function tapStep(step: number): number {
  anyNumber('step', step);
  // A tap step is a signed fraction; 2.5 % arrives as 0.025.
  if (Math.abs(step) >= 0.5) {
    throw new InputError('step', `${shown(step)} per tap is implausibly large; type the step as a percentage, e.g. 2.5%`);
  }
  return step;
}

/**
 * The tap position (HV winding tapped) whose secondary voltage is nearest the target, for a
 * supply voltage on HV. Raising the position raises the HV winding voltage and so lowers LV.
 * A tie goes to the position nearer the principal tap.
 */
export function bestTapPosition(
  supplyVolts: number,
  targetVolts: number,
  hvVolts: number,
  lvVolts: number,
  step: number,
  positionsEachSide: number,
): number {
  const supply = positive('supply_v', supplyVolts);
  const target = positive('target_v', targetVolts);
  const hv = positive('hv_v', hvVolts);
  const lv = positive('lv_v', lvVolts);
  const s = tapStep(step);
  const n = integerBetween('positions_each_side', positionsEachSide, 0, 99);
  let best = 0;
  let bestError = Infinity;
  // Walk outward from the principal tap so the first minimum found wins ties.
  for (let k = 0; k <= n; k++) {
    for (const p of k === 0 ? [0] : [-k, k]) {
      const factor = 1 + s * p;
      if (!(factor > 0)) continue;
      const error = Math.abs((supply * lv) / (hv * factor) - target);
      if (error < bestError - 1e-12 * target) {
        best = p;
        bestError = error;
      }
    }
  }
  if (!Number.isFinite(bestError)) throw new NoAnswerError('no tap position gives a positive winding voltage');
  return best;
}

/** Ratio-test deviation from the nameplate ratio, as a fraction: (measured − declared) / declared. */
export function ratioDeviation(measuredRatio: number, hvVolts: number, lvVolts: number, vectorGroup?: string): number {
  const measured = positive('measured_ratio', measuredRatio);
  const declared = turnsRatio(hvVolts, lvVolts, vectorGroup);
  return (measured - declared) / declared;
}

/**
 * Whether a measured ratio is within tolerance of the nameplate. The default ±0.5 % is the
 * ratio tolerance of IEEE C57.12.00 (from memory) and the usual cap in IEC 60076-1 Table 1
 * (the lower of ±0.5 % and 1/10 of the impedance percentage).
 */
export function ratioWithinTolerance(
  measuredRatio: number,
  hvVolts: number,
  lvVolts: number,
  vectorGroup: string | undefined,
  tolerance: number,
): boolean {
  const tol = fractionBelowOne('tolerance', tolerance);
  // Compare with a hair of slack so a reading exactly on the limit passes, as the standards read.
  return Math.abs(ratioDeviation(measuredRatio, hvVolts, lvVolts, vectorGroup)) <= tol * (1 + 1e-12);
}

/** Phase displacement in degrees of a vector group (clock number × 30°). */
export function vectorGroupShift(vectorGroup: string): number {
  return phaseDisplacement(parseVectorGroup('vector_group', vectorGroup));
}

