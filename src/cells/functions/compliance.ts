import { meetsEfficiencyRule, type Rule } from '../../core/efficiencyRules';
import { doeTable, kva, p0, pk, withSample } from '../arguments';
import { choice, inGroup, num } from '../declaration';

const { each } = inGroup('Efficiency regulations');

/** Kept in its own group file so it stands at the end of the catalog. */
export const COMPLIES = each({
  name: 'COMPLIES',
  help: 'TRUE when test-report losses meet the rule: "DOE" (efficiency at the test load ≥ DOEMIN; losses at 60 Hz, load loss at 55 °C liquid-immersed or 75 °C dry-type), "EU" (p0_w and pk_w ≤ EUMAXLOSS, three-phase liquid only; 50 Hz, load loss at 75 °C) or "both", which takes the DOE losses in p0_w, pk_w and the EU losses in p0_eu_w, pk_eu_w.',
  source: '10 CFR 431.196 and its test procedure (10 CFR 431 subpart K, appendix A); EU Regulation 548/2014 Annex I Table I.1 Tier 2 (EU values from memory)',
  args: [
    withSample(kva, 500),
    withSample(p0, 420),
    withSample(pk, 3800),
    withSample(
      choice('rule', '"DOE", "EU" or "both" (then p0_w, pk_w are the DOE losses and p0_eu_w, pk_eu_w the EU ones).', {
        options: ['DOE', 'EU', 'both'] as const satisfies readonly Rule[],
      }),
      'both',
    ),
    ...doeTable,
    num('p0_eu_w', 'W', 'For "both": no-load loss measured for the EU rule (50 Hz).', 410, { optional: true }),
    num('pk_eu_w', 'W', 'For "both": load loss at rated current at 75 °C, for the EU rule.', 3850, { optional: true }),
  ],
  result: { type: 'boolean', unit: 'TRUE/FALSE' },
  compute: meetsEfficiencyRule,
});
