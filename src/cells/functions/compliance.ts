import { meetsEfficiencyRule } from '../../core/efficiencyRules';
import { each, num, text } from '../declaration';

/** Kept in its own group file so it stands at the end of the catalog. */
export const COMPLIES = each({
  name: 'COMPLIES',
  group: 'Efficiency regulations',
  help: 'TRUE when test-report losses meet the rule: "DOE" (efficiency at the test load ≥ DOEMIN; losses at 60 Hz, load loss at 55 °C for liquid-immersed), "EU" (p0_w and pk_w ≤ EUMAXLOSS, three-phase liquid only; 50 Hz, load loss at 75 °C) or "both", which takes the DOE losses in p0_w, pk_w and the EU losses in p0_eu_w, pk_eu_w.',
  source: '10 CFR 431.196 and its test procedure (10 CFR 431 subpart K, appendix A); EU Regulation 548/2014 Annex I Table I.1 Tier 2 (EU values from memory)',
  args: [
    num('kva', 'kVA', 'Nameplate rating.', 500),
    num('p0_w', 'W', 'No-load loss from the test report.', 420),
    num('pk_w', 'W', 'Load loss at rated current from the test report, at the rule’s reference temperature (for "both": the DOE one).', 3800),
    text('rule', '"DOE", "EU" or "both".', 'both'),
    text('kind', '"liquid", "submersible", "lvdry" or "mvdry".', 'liquid', { default: 'liquid' }),
    num('phases', 'phases', '1 or 3.', 3, { default: 3 }),
    num('levels', 'year', 'DOE levels: 2016 or 2029.', 2016, { default: 2016 }),
    num('bil_kv', 'kV', 'Basic impulse level; needed for "mvdry" only.', 95, { optional: true }),
    num('p0_eu_w', 'W', 'For "both": no-load loss measured for the EU rule (50 Hz).', 410, { optional: true }),
    num('pk_eu_w', 'W', 'For "both": load loss at rated current at 75 °C for the EU rule.', 3850, { optional: true }),
  ],
  result: { type: 'boolean', unit: 'TRUE/FALSE' },
  compute: meetsEfficiencyRule,
});
