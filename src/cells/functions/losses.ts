import { loadLossAt, loadLossAtTemperature, parseLossStandard, parseMaterial, totalLossesAt } from '../../core/losses';
import { each, num, text } from '../declaration';

const GROUP = 'Losses';
const pk = num('pk_w', 'W', 'Load loss at rated current (test report).', 10500);
const load = num('load', 'per unit', 'Load as a fraction of nameplate kVA; 1 = full load, 50% = half load.', 0.5);

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
  args: [num('p0_w', 'W', 'No-load (core) loss (test report).', 1400), pk, load],
  result: { type: 'number', unit: 'W' },
  compute: totalLossesAt,
});

// Winding temperatures at which load loss is usually stated, for the help texts.
const REFERENCE_TEMPERATURES =
  '85 °C for 65 °C-rise liquid-immersed units (IEEE C57.12.00), 75 °C (IEC 60076-1), 55 °C for liquid-immersed and 75 °C for dry-type units under the US DOE test procedure (10 CFR 431 subpart K, appendix A)';

export const LOSSTEMP = each({
  name: 'LOSSTEMP',
  group: GROUP,
  help: `Load loss moved from one winding temperature to another: the I²R part by (Tk + to)/(Tk + from), the stray part inversely. Usual reference temperatures: ${REFERENCE_TEMPERATURES}. With i2r_w blank the whole loss is taken as I²R when correcting hotter (the largest the result can be) and refused when correcting cooler, where that would understate the loss.`,
  source: 'IEEE C57.12.90 load-loss temperature correction; IEC 60076-1 clause 11.4 (from memory)',
  args: [
    pk,
    num('from_c', '°C', 'Winding temperature at which pk_w was measured.', 25),
    num('to_c', '°C', 'Reference temperature wanted: 85 °C (IEEE, 65 °C rise), 75 °C (IEC), 55 °C (US DOE, liquid-immersed).', 85),
    num('i2r_w', 'W', 'The I²R part of pk_w at from_c (measured resistance × current²); needed when to_c is below from_c, blank otherwise treats all of pk_w as I²R.', 9000, {
      optional: true,
    }),
    text('material', 'Winding conductor: "Cu" or "Al".', 'Cu', { default: 'Cu' }),
    text('standard', '"IEEE" (copper Tk 234.5) or "IEC" (copper Tk 235); aluminium is 225 in both.', 'IEEE', { default: 'IEEE' }),
  ],
  result: { type: 'number', unit: 'W' },
  compute: (pkW: number, from: number, to: number, i2r: number | undefined, material: string, standard: string) =>
    loadLossAtTemperature(pkW, from, to, i2r, parseMaterial(material), parseLossStandard(standard)),
});
