import { loadLossAt, loadLossAtTemperature, totalLossesAt } from '../../core/losses';
import { load, p0, pk } from '../arguments';
import { choice, each, num } from '../declaration';

const GROUP = 'Losses';

export const LOADLOSS = each({
  name: 'LOADLOSS',
  group: GROUP,
  help: 'Load (winding) loss at a per-unit load: pk_w × load².',
  source: 'I²R loss scales with current squared (common practice)',
  args: [pk, load],
  result: { type: 'number', unit: 'W' },
  compute: loadLossAt,
});

export const LOSSES = each({
  name: 'LOSSES',
  group: GROUP,
  help: 'Total losses at a per-unit load: no-load loss + load loss × load².',
  source: 'common practice',
  args: [p0, pk, load],
  result: { type: 'number', unit: 'W' },
  compute: totalLossesAt,
});

export const LOSSTEMP = each({
  name: 'LOSSTEMP',
  group: GROUP,
  help: 'Load loss moved from one winding temperature to another: the I²R part by (Tk + to)/(Tk + from), the stray part inversely. Without i2r_w the whole loss is treated as I²R.',
  source: 'IEEE C57.12.90 load-loss temperature correction; IEC 60076-1 clause 11.4 (from memory)',
  args: [
    pk,
    num('from_c', '°C', 'Winding temperature at which pk_w was measured.', 25),
    num('to_c', '°C', 'Reference temperature wanted: 85 °C for 65 °C-rise units (IEEE), 75 °C (IEC).', 85),
    num('i2r_w', 'W', 'The I²R part of pk_w at from_c (measured resistance × current²); blank treats all of pk_w as I²R.', 9000, {
      optional: true,
    }),
    choice('material', 'Winding conductor: "Cu" or "Al".', {
      options: ['Cu', 'Al'],
      aliases: { copper: 'Cu', aluminium: 'Al', aluminum: 'Al' },
      default: 'Cu',
    }),
    choice('standard', '"IEEE" (copper Tk 234.5) or "IEC" (copper Tk 235); aluminium is 225 in both.', { options: ['IEEE', 'IEC'], default: 'IEEE' }),
  ],
  result: { type: 'number', unit: 'W' },
  compute: loadLossAtTemperature,
});
