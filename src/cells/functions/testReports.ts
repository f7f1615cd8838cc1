import { impedanceAtTemperature, resistanceAtTemperature } from '../../core/losses';
import { peakShortCircuitCurrent, SHORT_CIRCUIT_LIMIT_C, shortCircuitTemperature } from '../../core/shortCircuit';
import { TEST_ITEM_ALIASES, TEST_ITEMS, toleranceLimit, withinTolerance, type TestStandard, type WindingArrangement } from '../../core/testReport';
import { i2rPart, impedance, kva, material, measuredAt, phases, referenceTemperature, sourceMva, temperatureConstant, volts, withSample } from '../arguments';
import { choice, inGroup, num } from '../declaration';

const { each } = inGroup('Test reports and short circuit');

const item = withSample(
  choice(
    'item',
    'What is checked: "no-load loss" (p0), "load loss" (pk), "total loss" (total), "impedance" (z), "ratio" or "no-load current" (i0).',
    { options: TEST_ITEMS, aliases: TEST_ITEM_ALIASES },
  ),
  'total loss',
);
const standard = choice('standard', '"IEC" (IEC 60076-1 Table 1) or "IEEE" (IEEE C57.12.00).', {
  options: ['IEC', 'IEEE'] as const satisfies readonly TestStandard[],
  default: 'IEC',
});
const zForRatio = num('z', 'fraction', 'Measured impedance, e.g. 6%; needed for the IEC ratio tolerance (the lower of ±0.5 % and z / 10).', 0.06, {
  optional: true,
});
const windings = choice('windings', '"two-winding" (default) or "other": three or more windings, a zigzag winding or an autotransformer.', {
  options: ['two-winding', 'other'] as const satisfies readonly WindingArrangement[],
  default: 'two-winding',
});
/** The guaranteed value a test result is held against, in TESTTOL and TESTOK. */
const guaranteed = num('guaranteed', 'as the item', 'Guaranteed (declared) value: W for losses, a fraction for impedance and no-load current (e.g. 6%), the ratio itself for ratio.', 12000);

/** What a tolerance also depends on, last in TESTTOL and TESTOK: the measured impedance (IEC ratio) and the windings (impedance, IEC ratio). */
const unitDetails = [zForRatio, windings] as const;

export const TESTTOL = each({
  name: 'TESTTOL',
  help: 'Highest (bound "upper") or lowest ("lower") test result the standard accepts for a guarantee: losses +15 % each and +10 % total (IEC) or no-load +10 % and total +6 % (IEEE); impedance ±7.5 % / ±10 %; ratio the lower of ±0.5 % and z/10 (IEC) or ±0.5 % (IEEE); no-load current +30 % (IEC). #N/A where the standard sets no such limit.',
  source: 'IEC 60076-1 Table 1 (losses and ratio rows confirmed in a stored copy of the 1993+A1 edition; impedance and no-load current from memory); IEEE C57.12.00 tolerances (from memory; impedance row as quoted for IEEE dry-type units)',
  args: [
    item,
    guaranteed,
    standard,
    choice('bound', '"upper" for the highest accepted result, "lower" for the lowest.', { options: ['upper', 'lower'], default: 'upper' }),
    ...unitDetails,
  ],
  result: { type: 'number', unit: 'as guaranteed' },
  compute: toleranceLimit,
});

export const TESTOK = each({
  name: 'TESTOK',
  help: 'TRUE when a test result lies within the standard’s tolerance of its guarantee (see TESTTOL); a result on the limit passes. A component loss passes on its own +15 % (IEC) only if the total loss passes too: check "total loss" as well.',
  source: 'IEC 60076-1 Table 1; IEEE C57.12.00 tolerances (see TESTTOL)',
  args: [
    num('measured', 'as the item', 'Result from the test report, in the unit of the guarantee.', 12800),
    guaranteed,
    item,
    standard,
    ...unitDetails,
  ],
  result: { type: 'boolean', unit: 'TRUE/FALSE' },
  compute: withinTolerance,
});

export const RCORR = each({
  name: 'RCORR',
  help: 'Winding resistance at another temperature: r_ohm × (Tk + to_c) / (Tk + from_c), Tk 234.5 (copper, IEEE), 235 (copper, IEC) or 225 (aluminium).',
  source: 'IEEE C57.12.90 and IEC 60076-1 resistance temperature correction (from memory); copper Tk checked against the 0.00393 /K coefficient of annealed copper',
  args: [
    num('r_ohm', 'Ω', 'Measured winding resistance.', 0.412),
    num('from_c', '°C', 'Winding temperature at the measurement (often the oil or ambient temperature of a cold unit).', 22),
    num('to_c', '°C', 'Temperature wanted, e.g. 75 or 85.', 75),
    ...temperatureConstant,
  ],
  result: { type: 'number', unit: 'Ω' },
  compute: resistanceAtTemperature,
});

export const ZCORR = each({
  name: 'ZCORR',
  help: 'Impedance moved to the reference temperature as IEEE C57.12.90 does it: the resistive part pk_w / (kva × 1000) is corrected with the load loss (see LOSSTEMP), the reactive part √(z² − r²) stays. i2r_w as in LOSSTEMP: needed when correcting cooler.',
  source: 'IEEE C57.12.90 impedance and load-loss temperature correction (from memory)',
  args: [
    num('z', 'fraction', 'Impedance measured at from_c, e.g. 5.62%.', 0.0562),
    kva,
    num('pk_w', 'W', 'Load loss measured at from_c with the impedance.', 9800),
    measuredAt,
    referenceTemperature,
    withSample(i2rPart, 8600),
    ...temperatureConstant,
  ],
  result: { type: 'number', unit: 'fraction' },
  compute: impedanceAtTemperature,
});

export const IPEAK = each({
  name: 'IPEAK',
  help: 'Asymmetrical peak short-circuit current at the secondary terminals: ISC × k√2, the IEC 60076-5 peak factor of the combined X/R (1.8√2 above X/R 14). Leave source_mva blank for an infinite source; a source without X/R is taken as pure reactance (the larger peak). Planning estimate: to be verified by a qualified engineer.',
  source: 'IEC 60076-5 peak factor k√2 (table values from memory), computed as the exact first peak of an R-L circuit switched onto a sine; checked against the IEC 60909 κ approximation',
  args: [
    kva,
    volts,
    impedance,
    num('x_r', 'ratio', 'X/R of the transformer impedance, e.g. 5.', 5),
    sourceMva,
    num('source_x_r', 'ratio', 'X/R of the supply; blank takes it as pure reactance.', 15, { optional: true }),
    phases,
  ],
  result: { type: 'number', unit: 'A' },
  compute: peakShortCircuitCurrent,
});

export const SCTEMP = each({
  name: 'SCTEMP',
  help: 'Average winding temperature after a short circuit (IEC 60076-5 thermal withstand): θ0 + 2(θ0 + 235)/(106000/(J²t) − 1) for copper, 225 and 45700 for aluminium. The limit for oil-immersed units is 250 °C (Cu) or 200 °C (Al); output "limit" returns it. Planning estimate: to be verified by a qualified engineer.',
  source: 'IEC 60076-5 thermal ability to withstand short circuit, θ1 formula and limits (from memory; copper formula and the 250/200 °C limits as quoted by secondary sources)',
  args: [
    num('j_a_mm2', 'A/mm²', 'Short-circuit current density in the winding, rms symmetrical (rated density / per-unit impedance, with the source where it counts).', 55),
    num('t_s', 's', 'Duration of the short circuit; IEC 60076-5 uses 2 s unless agreed otherwise.', 2, { default: 2 }),
    material,
    num('theta0_c', '°C', 'Winding temperature at the start: 105 °C (40 °C ambient + 65 K average winding rise) unless known.', 105, { default: 105 }),
    choice('output', '"temperature" (θ1, the default) or "limit" (the standard’s highest permissible θ1 for the material).', {
      options: ['temperature', 'limit'],
      default: 'temperature',
    }),
  ],
  result: { type: 'number', unit: '°C' },
  compute: (j, t, m, theta0, output) => {
    const temperature = shortCircuitTemperature(j, t, m, theta0);
    return output === 'limit' ? SHORT_CIRCUIT_LIMIT_C[m] : temperature;
  },
});
