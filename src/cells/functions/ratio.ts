import {
  bestTapPosition,
  idealOutputCurrent,
  idealOutputVoltage,
  ratioDeviation,
  ratioWithinTolerance,
  tapVoltage,
  turnsRatio,
  vectorGroupShift,
} from '../../core/ratio';
import { inGroup, num, text } from '../declaration';

const { each } = inGroup('Ratio and voltage');
const hv = num('hv_v', 'V', 'HV rated voltage, line-to-line for three-phase.', 13200);
const lv = num('lv_v', 'V', 'LV rated voltage, line-to-line for three-phase.', 480);
const vectorGroup = text(
  'vector_group',
  'Three-phase vector group such as Dyn11, YNd1 or Yy0; leave blank for a single-phase unit or the plain voltage ratio.',
  'Dyn11',
  { optional: true },
);
/** The nameplate ratio's arguments: RATIO takes them, and the ratio-test functions compare with it. */
const nameplate = [hv, lv, vectorGroup] as const;

/** Turns of the input and output windings of the ideal transformer. */
const turns = [num('turns_in', 'turns', 'Turns of the input winding.', 100), num('turns_out', 'turns', 'Turns of the output winding.', 10)] as const;

export const RATIO = each({
  name: 'RATIO',
  help: 'Winding turns ratio HV:LV; with a vector group, the ratio of the phase-winding voltages (Dyn11: hv / (lv/√3)).',
  source: 'IEC 60076-1 (vector groups); ideal transformer, Vs/Vp = Ns/Np',
  args: [...nameplate],
  result: { type: 'number', unit: 'ratio' },
  compute: turnsRatio,
});

export const VOUT = each({
  name: 'VOUT',
  help: 'Ideal transformer output voltage: v_in × turns_out / turns_in.',
  source: 'ideal transformer, Vs/Vp = Ns/Np (common practice)',
  args: [
    num('v_in', 'V', 'Voltage applied to the input winding.', 240),
    ...turns,
  ],
  result: { type: 'number', unit: 'V' },
  compute: idealOutputVoltage,
});

export const IOUT = each({
  name: 'IOUT',
  help: 'Ideal transformer output current: i_in × turns_in / turns_out (current goes the inverse way of voltage).',
  source: 'ideal transformer, Is/Ip = Np/Ns (common practice)',
  args: [
    num('i_in', 'A', 'Current in the input winding.', 2),
    ...turns,
  ],
  result: { type: 'number', unit: 'A' },
  compute: idealOutputCurrent,
});

const step = num('step', 'fraction', 'Voltage change per tap step as a percentage, e.g. 2.5%.', 0.025);

export const TAPV = each({
  name: 'TAPV',
  help: 'Voltage of a tapped winding at a tap position: rated_v × (1 + step × position); position 0 is the principal tap.',
  source: 'IEC 60076-1 tapping quantities (common practice)',
  args: [
    num('rated_v', 'V', 'Rated voltage of the tapped winding at the principal tap.', 13200),
    step,
    num('position', 'steps', 'Tap position, a whole number; negative below the principal tap.', 2),
  ],
  result: { type: 'number', unit: 'V' },
  compute: tapVoltage,
});

export const TAPBEST = each({
  name: 'TAPBEST',
  help: 'HV tap position whose LV voltage is nearest the target for the given supply voltage; ties go to the position nearer the principal tap.',
  source: 'IEC 60076-1 tapping quantities (common practice)',
  args: [
    num('supply_v', 'V', 'Actual supply voltage on the HV side.', 12870),
    num('target_v', 'V', 'Wanted LV voltage.', 480),
    hv,
    lv,
    step,
    num('positions_each_side', 'steps', 'Number of tap positions above and below the principal tap, e.g. 2 for ±2 × 2.5%.', 2),
  ],
  result: { type: 'number', unit: 'position' },
  compute: bestTapPosition,
});

const measured = num('measured_ratio', 'ratio', 'Turns ratio read by the ratio test (HV:LV, per phase).', 47.7);
/** A ratio test: the measured ratio and the nameplate it is compared with (RATIODEV, RATIOOK). */
const ratioTest = [measured, ...nameplate] as const;

export const RATIODEV = each({
  name: 'RATIODEV',
  help: 'Deviation of a measured turns ratio from the nameplate ratio, as a fraction: (measured − nameplate) / nameplate.',
  source: 'IEEE C57.12.90 ratio test; IEC 60076-1 Table 1',
  args: [...ratioTest],
  result: { type: 'number', unit: 'fraction' },
  compute: ratioDeviation,
});

export const RATIOOK = each({
  name: 'RATIOOK',
  help: 'TRUE when a measured turns ratio is within tolerance of the nameplate ratio (default ±0.5 %).',
  source: 'IEEE C57.12.00 ratio tolerance ±0.5 % (from memory); IEC 60076-1 Table 1',
  args: [
    ...ratioTest,
    num('tolerance', 'fraction', 'Allowed deviation as a percentage; IEC 60076-1 also caps it at 1/10 of the impedance percentage.', 0.005, {
      default: 0.005,
    }),
  ],
  result: { type: 'boolean', unit: 'TRUE/FALSE' },
  compute: ratioWithinTolerance,
});

export const SHIFT = each({
  name: 'SHIFT',
  help: 'Phase displacement of LV behind HV in degrees for a vector group: clock number × 30°.',
  source: 'IEC 60076-1 clause 3.10 and Annex D (vector groups)',
  args: [text('vector_group', 'Three-phase vector group such as Dyn11.', 'Dyn11')],
  result: { type: 'number', unit: '°' },
  compute: vectorGroupShift,
});
