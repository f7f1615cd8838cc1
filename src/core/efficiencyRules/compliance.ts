/** Whether a unit's test-report losses meet the DOE minimum efficiency, the EU maximum losses, or both. */
import { efficiencyAt } from '../efficiency';
import { InputError, NotInTableError } from '../errors';
import { nonNegative, phaseCount, positive } from '../guards';
import { doeMinimumOf, doeTableFor, type DoeKind } from './doe';
import { euMaximumLoss } from './eu';

export type Rule = 'DOE' | 'EU' | 'both';

/**
 * TRUE when the losses meet the rule. DOE: the efficiency at the table's test load (50 %, or 35 %
 * for low-voltage dry-type), power factor 1, is at least the minimum, compared unrounded. EU: both
 * P0 and Pk are at most the Tier 2 maxima (three-phase liquid-immersed only).
 *
 * Each rule judges losses measured its own way: the DOE test procedure (10 CFR 431 subpart K,
 * appendix A) at 60 Hz with the load loss at 55 °C (liquid-immersed) or 75 °C (dry-type), the EU rule at
 * 50 Hz with the load loss at 75 °C (IEC 60076-1). One pair of losses cannot be right for both,
 * so "both" takes the DOE losses in p0_w, pk_w and the EU losses in p0_eu_w, pk_eu_w, and refuses
 * when the EU pair is blank.
 */
export function meetsEfficiencyRule(
  kva: number,
  p0Watts: number,
  pkWatts: number,
  rule: Rule,
  kind: DoeKind,
  phases: number,
  levels: number,
  bilKv: number | undefined,
  p0EuWatts?: number,
  pkEuWatts?: number,
): boolean {
  const s = positive('kva', kva);
  const p0 = nonNegative('p0_w', p0Watts);
  const pk = nonNegative('pk_w', pkWatts);
  let euP0 = p0;
  let euPk = pk;
  if (rule === 'both') {
    if (p0EuWatts === undefined || pkEuWatts === undefined) {
      throw new InputError(
        p0EuWatts === undefined ? 'p0_eu_w' : 'pk_eu_w',
        'is blank; "both" needs the EU losses (50 Hz, load loss at 75 °C) in p0_eu_w and pk_eu_w as well as the DOE losses (60 Hz, load loss at 55 °C liquid-immersed or 75 °C dry-type) in p0_w and pk_w',
      );
    }
    euP0 = nonNegative('p0_eu_w', p0EuWatts);
    euPk = nonNegative('pk_eu_w', pkEuWatts);
  }
  let ok = true;
  if (rule !== 'EU') {
    const t = doeTableFor(kind, phases, levels, bilKv);
    ok = efficiencyAt(s, p0, pk, t.testLoad, 1) >= doeMinimumOf(t, s);
  }
  if (rule !== 'DOE') {
    if (kind !== 'liquid' || phaseCount('phases', phases) !== 3) {
      throw new NotInTableError('kind', 'the EU Tier 2 table in Fluxbook covers three-phase liquid-immersed units only');
    }
    ok = ok && euP0 <= euMaximumLoss(s, 'p0') && euPk <= euMaximumLoss(s, 'pk');
  }
  return ok;
}
