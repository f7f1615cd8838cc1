import { apparentPowerKva, faultCurrent, ratedCurrent, windingCurrent, type WindingSide } from '../../core/current';
import { blankable, impedance, kva, phases, sourceMva, volts, withSample } from '../arguments';
import { choice, inGroup, num, text } from '../declaration';

const { each } = inGroup('Current and power');

export const IRATED = each({
  name: 'IRATED',
  help: 'Rated line current: kVA·1000 / (√3·V) three-phase, kVA·1000 / V single-phase.',
  source: 'S = √3·V·I (common practice)',
  args: [kva, volts, phases],
  result: { type: 'number', unit: 'A' },
  compute: ratedCurrent,
});

export const IWINDING = each({
  name: 'IWINDING',
  help: 'Current in one phase winding: line current / √3 in a delta winding, the line current in star or zigzag. Give the letter of the winding v belongs to, or a whole vector group with side "HV" or "LV".',
  source: 'delta phase current = line current / √3 (common practice)',
  args: [
    kva,
    volts,
    text('vector_letter', 'Connection of the winding v belongs to: D, Y, YN, Z or ZN (either case); or a vector group such as Dyn11 together with side.', 'Dyn11'),
    phases,
    withSample(
      blankable(
        choice('side', '"HV" or "LV": the winding of the vector group that v belongs to; needed only when vector_letter is a whole vector group.', {
          options: ['HV', 'LV'] as const satisfies readonly WindingSide[],
          aliases: { high: 'HV', low: 'LV', primary: 'HV', secondary: 'LV' },
        }),
      ),
      'LV',
    ),
  ],
  result: { type: 'number', unit: 'A' },
  compute: windingCurrent,
});

export const KVA = each({
  name: 'KVA',
  help: 'Apparent power from line current and voltage: √3·V·I / 1000 three-phase, V·I / 1000 single-phase.',
  source: 'S = √3·V·I (common practice)',
  args: [num('a', 'A', 'Line current.', 1202.8), volts, phases],
  result: { type: 'number', unit: 'kVA' },
  compute: apparentPowerKva,
});

export const ISC = each({
  name: 'ISC',
  help: 'Symmetrical short-circuit current at the secondary terminals: rated current / (z + kVA / source kVA); leave source_mva blank for an infinite source.',
  source: 'IEC 60076-5 clause 4.2 (from memory); Isc = Ir / z for an infinite bus (common practice)',
  args: [
    kva,
    volts,
    impedance,
    sourceMva,
    phases,
  ],
  result: { type: 'number', unit: 'A' },
  compute: faultCurrent,
});
