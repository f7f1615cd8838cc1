import { meetsEfficiencyRule } from '../../core/efficiencyRules';
import { bil, doeKind, doeLevels, kva, p0, phases, pk, withSample } from '../arguments';
import { choice, each } from '../declaration';

/** Kept in its own group file so it stands at the end of the catalog. */
export const COMPLIES = each({
  name: 'COMPLIES',
  group: 'Efficiency regulations',
  help: 'TRUE when test-report losses meet the rule: "DOE" (efficiency at the test load ≥ DOEMIN), "EU" (p0_w and pk_w ≤ EUMAXLOSS, three-phase liquid only) or "both". Losses at each rule’s reference temperature.',
  source: '10 CFR 431.196 and EU Regulation 548/2014 Annex I Table I.1 Tier 2 (EU values from memory)',
  args: [
    withSample(kva, 500),
    withSample(p0, 420),
    withSample(pk, 3800),
    choice('rule', '"DOE", "EU" or "both".', { options: ['DOE', 'EU', 'both'] }),
    doeKind,
    phases,
    doeLevels,
    bil,
  ],
  result: { type: 'boolean', unit: 'TRUE/FALSE' },
  compute: meetsEfficiencyRule,
});
