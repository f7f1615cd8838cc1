import { apparentPowerKva, faultCurrent, ratedCurrent, windingCurrent } from '../../core/current';
import { oneOf } from '../../core/guards';
import { each, num, text } from '../declaration';

const GROUP = 'Current and power';
const kva = num('kva', 'kVA', 'Nameplate rating.', 1000);
const volts = num('v', 'V', 'Voltage, line-to-line for three-phase.', 480);
const phases = num('phases', 'phases', '1 or 3.', 3, { default: 3 });

export const IRATED = each({
  name: 'IRATED',
  group: GROUP,
  help: 'Rated line current: kVA·1000 / (√3·V) three-phase, kVA·1000 / V single-phase.',
  source: 'S = √3·V·I (common practice)',
  args: [kva, volts, phases],
  result: { type: 'number', unit: 'A' },
  compute: ratedCurrent,
});

export const IWINDING = each({
  name: 'IWINDING',
  group: GROUP,
  help: 'Current in one phase winding: line current / √3 in a delta winding, the line current in star or zigzag. Give the letter of the winding v belongs to, or a whole vector group with side "HV" or "LV".',
  source: 'delta phase current = line current / √3 (common practice)',
  args: [
    kva,
    volts,
    text('vector_letter', 'Connection of the winding v belongs to: D, Y, YN, Z or ZN (either case); or a vector group such as Dyn11 together with side.', 'D'),
    phases,
    text('side', '"HV" or "LV": the winding of the vector group that v belongs to; needed only when vector_letter is a whole vector group.', 'LV', {
      optional: true,
    }),
  ],
  result: { type: 'number', unit: 'A' },
  compute: (k: number, v: number, letter: string, p: number, side: string | undefined) =>
    windingCurrent(k, v, letter, p, side === undefined ? undefined : oneOf('side', side, ['HV', 'LV'] as const)),
});

export const KVA = each({
  name: 'KVA',
  group: GROUP,
  help: 'Apparent power from line current and voltage: √3·V·I / 1000 three-phase, V·I / 1000 single-phase.',
  source: 'S = √3·V·I (common practice)',
  args: [num('a', 'A', 'Line current.', 1202.8), volts, phases],
  result: { type: 'number', unit: 'kVA' },
  compute: apparentPowerKva,
});

export const ISC = each({
  name: 'ISC',
  group: GROUP,
  help: 'Symmetrical short-circuit current at the secondary terminals: rated current / (z + kVA / source kVA); leave source_mva blank for an infinite source.',
  source: 'IEC 60076-5 clause 4.2 (from memory); Isc = Ir / z for an infinite bus (common practice)',
  args: [
    kva,
    volts,
    num('z', 'fraction', 'Impedance as a percentage of the rating, e.g. 5.75%.', 0.0575),
    num('source_mva', 'MVA', 'Short-circuit power of the supply; blank for an infinite source.', 500, { optional: true }),
    phases,
  ],
  result: { type: 'number', unit: 'A' },
  compute: faultCurrent,
});
