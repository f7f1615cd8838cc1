import { doeMinimumEfficiency, euMaximumLoss } from '../../core/efficiencyRules';
import { doeTable, kva, withSample } from '../arguments';
import { bool, choice, inGroup, num } from '../declaration';

const { each } = inGroup('Efficiency regulations');

export const DOEMIN = each({
  name: 'DOEMIN',
  help: 'US DOE minimum efficiency at the regulation’s test load (50 % of nameplate; 35 % for low-voltage dry-type) and power factor 1; ratings between table rows by linear interpolation, as the regulation directs. Units with an input above 34.5 kV or an output above 600 V are outside the regulation: #N/A. Blank voltages are taken as within it.',
  source: '10 CFR 431.196 (a)(2)–(a)(3), (b)(2)–(b)(4), (c)(2)–(c)(3); scope of 10 CFR 431.192',
  args: [
    withSample(kva, 500),
    ...doeTable,
    num('hv_v', 'V', 'Rated input (primary) voltage, line-to-line; checked against the regulation’s 34.5 kV and the 600 V line between "lvdry" and "mvdry".', 12470, { optional: true }),
    num('lv_v', 'V', 'Rated output (secondary) voltage, line-to-line; checked against the regulation’s 600 V.', 480, { optional: true }),
  ],
  result: { type: 'number', unit: 'fraction' },
  compute: doeMinimumEfficiency,
});

export const EUMAXLOSS = each({
  name: 'EUMAXLOSS',
  help: 'EU Ecodesign Tier 2 maximum loss of a three-phase liquid-immersed, ground-mounted medium power transformer (≤ 3150 kVA, windings Um ≤ 24 kV and ≤ 1.1 kV): which = "pk" (load loss) or "p0" (no-load loss). Higher Um or pole-mounted: #N/A (other tables of Annex I, not held). Blank Um values are taken as within the table. Table values from memory: confirm against the regulation.',
  source: 'EU Regulation 548/2014 Annex I Table I.1 Tier 2, as amended by 2019/1783 (values from memory)',
  args: [
    withSample(kva, 500),
    choice('which', '"pk" for the maximum load loss, "p0" (or "Po", as the regulation writes it) for the maximum no-load loss.', { options: ['pk', 'p0'], aliases: { Po: 'p0' } }),
    num('hv_um_kv', 'kV', 'Highest voltage for equipment Um of the high-voltage winding, e.g. 24.', 24, { optional: true }),
    num('lv_um_kv', 'kV', 'Um of the other winding, e.g. 1.1.', 1.1, { optional: true }),
    bool('pole_mounted', 'TRUE for a pole-mounted unit (its own table in Annex I, not held); blank or FALSE otherwise.', false, { default: false }),
  ],
  result: { type: 'number', unit: 'W' },
  compute: euMaximumLoss,
});
