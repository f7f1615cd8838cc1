import { doeMinimumEfficiency, euMaximumLoss } from '../../core/efficiencyRules';
import { each, num, text } from '../declaration';

const GROUP = 'Efficiency regulations';
const kva = num('kva', 'kVA', 'Nameplate rating.', 500);
const kind = text('kind', 'Kind of unit: "liquid", "submersible", "lvdry" (low-voltage dry-type) or "mvdry" (medium-voltage dry-type).', 'liquid');
const phases = num('phases', 'phases', '1 or 3.', 3);
const levels = num('levels', 'year', '2016 for units made from 1 January 2016; 2029 for units made from 23 April 2029.', 2016, { default: 2016 });
const bil = num('bil_kv', 'kV', 'Basic impulse level of the high-voltage winding; needed for "mvdry" only.', 95, { optional: true });

export const DOEMIN = each({
  name: 'DOEMIN',
  group: GROUP,
  help: 'US DOE minimum efficiency at the regulation’s test load (50 % of nameplate; 35 % for low-voltage dry-type) and power factor 1; ratings between table rows by linear interpolation, as the regulation directs.',
  source: '10 CFR 431.196 (a)(2)–(a)(3), (b)(2)–(b)(4), (c)(2)–(c)(3)',
  args: [kva, kind, phases, levels, bil],
  result: { type: 'number', unit: 'fraction' },
  compute: doeMinimumEfficiency,
});

export const EUMAXLOSS = each({
  name: 'EUMAXLOSS',
  group: GROUP,
  help: 'EU Ecodesign Tier 2 maximum loss of a three-phase liquid-immersed medium power transformer (≤ 3150 kVA, windings Um ≤ 24 kV and ≤ 1.1 kV): which = "pk" (load loss) or "p0" (no-load loss). Table values from memory: confirm against the regulation.',
  source: 'EU Regulation 548/2014 Annex I Table I.1 Tier 2, as amended by 2019/1783 (values from memory)',
  args: [kva, text('which', '"pk" for the maximum load loss, "p0" for the maximum no-load loss.', 'pk')],
  result: { type: 'number', unit: 'W' },
  compute: euMaximumLoss,
});
