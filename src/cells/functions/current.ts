import { apparentPowerKva, faultCurrent, ratedCurrent, windingCurrent } from '../../core/current';
import { impedance, kva, phases, volts } from '../arguments';
import { each, num, text } from '../declaration';

const GROUP = 'Current and power';

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
  help: 'Current in one phase winding: line current / √3 in a delta winding, the line current in star or zigzag.',
  source: 'delta phase current = line current / √3 (common practice)',
  args: [
    kva,
    volts,
    text('vector_letter', 'Connection of the winding: D, Y, YN, Z or ZN (either case).', 'D'),
    phases,
  ],
  result: { type: 'number', unit: 'A' },
  compute: windingCurrent,
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
    impedance,
    num('source_mva', 'MVA', 'Short-circuit power of the supply; blank for an infinite source.', 500, { optional: true }),
    phases,
  ],
  result: { type: 'number', unit: 'A' },
  compute: faultCurrent,
});
