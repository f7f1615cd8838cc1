/**
 * Acceptance of a routine-test result against its guarantee: the tolerances of IEC 60076-1
 * Table 1 and of IEEE C57.12.00 (its tolerance clauses for ratio, impedance and losses). Every
 * tolerance is a fraction of the guaranteed (declared) value; docs/references.md, "Test reports
 * and short circuit", says which rows were read in a stored copy and which are from memory.
 */
import { InputError, NotInTableError, shown } from './errors';
import { anyNumber, perUnitImpedance, positive } from './guards';

export type TestItem = 'no-load loss' | 'load loss' | 'total loss' | 'impedance' | 'ratio' | 'no-load current';
export type TestStandard = 'IEC' | 'IEEE';
/** Two-winding units, or any other: three or more windings, a zigzag winding, an autotransformer. */
export type WindingArrangement = 'two-winding' | 'other';
export type Bound = 'upper' | 'lower';

export const TEST_ITEMS: readonly TestItem[] = ['no-load loss', 'load loss', 'total loss', 'impedance', 'ratio', 'no-load current'];
/** The short names a test sheet uses for the same items. */
export const TEST_ITEM_ALIASES: Readonly<Record<string, TestItem>> = {
  p0: 'no-load loss',
  pk: 'load loss',
  total: 'total loss',
  z: 'impedance',
  i0: 'no-load current',
};

/** A band around the guaranteed value: the result may lie from (1 − below) to (1 + above) times it. */
export interface Tolerance {
  /** Fraction allowed above the guarantee. */
  readonly above: number;
  /** Fraction allowed below it; undefined where the standard sets no lower limit (losses, no-load current). */
  readonly below: number | undefined;
  /** The row of the standard the tolerance comes from, for messages. */
  readonly clause: string;
}

const IEC = 'IEC 60076-1 Table 1';
const IEEE = 'IEEE C57.12.00';

/**
 * The tolerance of one item. `z` is the impedance as measured, needed for the IEC ratio row
 * (the lower of ±0.5 % and ±1/10 of the actual percentage impedance); `guaranteedZ` for the IEC
 * impedance row, whose band depends on the declared impedance (±7.5 % from 10 % up, ±10 % below).
 */
export function toleranceOf(
  item: TestItem,
  standard: TestStandard,
  arrangement: WindingArrangement,
  guaranteed: number,
  z: number | undefined,
): Tolerance {
  if (standard === 'IEC') {
    if (arrangement === 'other' && (item === 'impedance' || item === 'ratio')) {
      throw new NotInTableError(
        'windings',
        `${IEC} sets the ${item} tolerance of a winding pair other than the first of a two-winding unit by agreement or by other rows, not held here`,
      );
    }
    switch (item) {
      case 'total loss':
        return { above: 0.1, below: undefined, clause: `${IEC}, item 1 a): +10 % of the total losses` };
      case 'no-load loss':
      case 'load loss':
        // "+15 % of each component loss, provided that the tolerance for total losses is not exceeded".
        return { above: 0.15, below: undefined, clause: `${IEC}, item 1 b): +15 % of each component loss, with the total within +10 %` };
      case 'ratio': {
        if (z === undefined) {
          throw new InputError('z', `is blank; the ${IEC} ratio tolerance is the lower of ±0.5 % and 1/10 of the measured impedance, so give the impedance, e.g. 6%`);
        }
        const t = Math.min(0.005, perUnitImpedance('z', z) / 10);
        return { above: t, below: t, clause: `${IEC}, item 2: the lower of ±0.5 % and ±1/10 of the impedance` };
      }
      case 'impedance': {
        const t = guaranteed >= 0.1 ? 0.075 : 0.1;
        return { above: t, below: t, clause: `${IEC} (from memory): ±7.5 % of the declared impedance from 10 % up, ±10 % below` };
      }
      case 'no-load current':
        return { above: 0.3, below: undefined, clause: `${IEC} (from memory): +30 % of the declared no-load current` };
    }
  }
  switch (item) {
    case 'no-load loss':
      return { above: 0.1, below: undefined, clause: `${IEEE} (from memory): no-load losses at most 10 % above the specified` };
    case 'total loss':
      return { above: 0.06, below: undefined, clause: `${IEEE} (from memory): total losses at most 6 % above the specified` };
    case 'load loss':
      throw new NotInTableError('item', `${IEEE} sets no separate tolerance on load loss; it is bounded through the total losses (+6 %): check "total loss"`);
    case 'no-load current':
      throw new NotInTableError('item', `${IEEE} sets no tolerance on the exciting (no-load) current; compare it with the value agreed with the manufacturer`);
    case 'ratio':
      return { above: 0.005, below: 0.005, clause: `${IEEE} (from memory): ±0.5 % of the nameplate ratio` };
    case 'impedance': {
      const t = arrangement === 'two-winding' ? 0.075 : 0.1;
      return {
        above: t,
        below: t,
        clause: `${IEEE}: ±7.5 % of the specified impedance for two-winding units, ±10 % for three or more windings, zigzag and autotransformers`,
      };
    }
  }
}

function checkedGuarantee(item: TestItem, guaranteed: number): number {
  const g = positive('guaranteed', guaranteed);
  if (item === 'impedance') perUnitImpedance('guaranteed', g);
  if (item === 'no-load current' && g >= 1) {
    throw new InputError('guaranteed', `${shown(g)} is 100 % of rated current or more; give the no-load current as a percentage, e.g. ${shown(g)}% or ${shown(g / 100)}`);
  }
  return g;
}

/** The highest or lowest acceptable result for a guarantee, in the guarantee's own unit. */
export function toleranceLimit(
  item: TestItem,
  guaranteed: number,
  standard: TestStandard,
  bound: Bound,
  z: number | undefined,
  arrangement: WindingArrangement,
): number {
  const g = checkedGuarantee(item, guaranteed);
  const t = toleranceOf(item, standard, arrangement, g, z);
  if (bound === 'upper') return g * (1 + t.above);
  if (t.below === undefined) {
    throw new NotInTableError('bound', `${t.clause}: there is no lower limit for ${item}; ask for bound "upper"`);
  }
  return g * (1 - t.below);
}

/**
 * TRUE when the measured value is within the band. A value on the limit passes: the tolerances
 * are written as the most a result may deviate. The two sides are compared with a relative
 * margin of 1e-12 so that a result typed as exactly the limit is not failed by rounding.
 */
export function withinTolerance(
  measured: number,
  guaranteed: number,
  item: TestItem,
  standard: TestStandard,
  z: number | undefined,
  arrangement: WindingArrangement,
): boolean {
  const m = anyNumber('measured', measured);
  if (m < 0) throw new InputError('measured', `must be 0 or more (got ${shown(m)})`);
  if (item === 'impedance') perUnitImpedance('measured', m);
  const g = checkedGuarantee(item, guaranteed);
  const t = toleranceOf(item, standard, arrangement, g, z);
  const slack = 1e-12 * g;
  if (m > g * (1 + t.above) + slack) return false;
  if (t.below !== undefined && m < g * (1 - t.below) - slack) return false;
  return true;
}
