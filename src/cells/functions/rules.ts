import { doeMinimumEfficiency, euMaximumLoss } from '../../core/efficiencyRules';
import { bil, doeKind, doeLevels, kva, phases, withSample } from '../arguments';
import { choice, each } from '../declaration';

const GROUP = 'Efficiency regulations';

export const DOEMIN = each({
  name: 'DOEMIN',
  group: GROUP,
  help: 'US DOE minimum efficiency at the regulation’s test load (50 % of nameplate; 35 % for low-voltage dry-type) and power factor 1; ratings between table rows by linear interpolation, as the regulation directs.',
  source: '10 CFR 431.196 (a)(2)–(a)(3), (b)(2)–(b)(4), (c)(2)–(c)(3)',
  args: [withSample(kva, 500), doeKind, phases, doeLevels, bil],
  result: { type: 'number', unit: 'fraction' },
  compute: doeMinimumEfficiency,
});

export const EUMAXLOSS = each({
  name: 'EUMAXLOSS',
  group: GROUP,
  help: 'EU Ecodesign Tier 2 maximum loss of a three-phase liquid-immersed medium power transformer (≤ 3150 kVA, windings Um ≤ 24 kV and ≤ 1.1 kV): which = "pk" (load loss) or "p0" (no-load loss). Table values from memory: confirm against the regulation.',
  source: 'EU Regulation 548/2014 Annex I Table I.1 Tier 2, as amended by 2019/1783 (values from memory)',
  args: [withSample(kva, 500), choice('which', '"pk" for the maximum load loss, "p0" (or "Po", as the regulation writes it) for the maximum no-load loss.', { options: ['pk', 'p0'], aliases: { Po: 'p0' } })],
  result: { type: 'number', unit: 'W' },
  compute: euMaximumLoss,
});
