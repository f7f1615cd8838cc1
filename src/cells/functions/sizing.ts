import { nextStandardRating } from '../../core/sizing';
import { choice, each, num } from '../declaration';

export const SIZE = each({
  name: 'SIZE',
  group: 'Current and power',
  help: 'Next standard rating that carries the load with the margin: the smallest rating ≥ load_kva × (1 + margin) in the series "US1" (IEEE single-phase), "US3" (IEEE three-phase) or "IEC" (R10 series).',
  source: 'IEEE C57.12.00 preferred kVA ratings (from memory, secondary source cited in src/core/sizing.ts); IEC 60076-1 R10 preferred ratings',
  args: [
    num('load_kva', 'kVA', 'Load to carry, in kVA (kW / power factor).', 640),
    num('margin', 'fraction', 'Spare capacity to add, e.g. 20%; below 100 %.', 0.2, { default: 0 }),
    choice('series', 'Rating series: "US1", "US3" or "IEC".', { options: ['US1', 'US3', 'IEC'], default: 'US3' }),
  ],
  result: { type: 'number', unit: 'kVA' },
  compute: nextStandardRating,
});
