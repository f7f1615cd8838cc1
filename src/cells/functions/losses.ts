import { loadLossAt, loadLossAtTemperature, totalLossesAt } from '../../core/losses';
import { i2rPart, load, losses, measuredAt, pk, referenceTemperature, temperatureConstant } from '../arguments';
import { inGroup } from '../declaration';

const { each } = inGroup('Losses');

export const LOADLOSS = each({
  name: 'LOADLOSS',
  help: 'Load (winding) loss at a per-unit load: pk_w × load².',
  source: 'I²R loss scales with current squared (common practice)',
  args: [pk, load],
  result: { type: 'number', unit: 'W' },
  compute: loadLossAt,
});

export const LOSSES = each({
  name: 'LOSSES',
  help: 'Total losses at a per-unit load: no-load loss + load loss × load².',
  source: 'common practice',
  args: [...losses, load],
  result: { type: 'number', unit: 'W' },
  compute: totalLossesAt,
});

// Winding temperatures at which load loss is usually stated, for the help texts.
const REFERENCE_TEMPERATURES =
  '85 °C for 65 °C-rise liquid-immersed units (IEEE C57.12.00), 75 °C (IEC 60076-1), 55 °C for liquid-immersed and 75 °C for dry-type units under the US DOE test procedure (10 CFR 431 subpart K, appendix A)';

export const LOSSTEMP = each({
  name: 'LOSSTEMP',
  help: `Load loss moved from one winding temperature to another: the I²R part by (Tk + to)/(Tk + from), the stray part inversely. Usual reference temperatures: ${REFERENCE_TEMPERATURES}. With i2r_w blank the whole loss is taken as I²R when correcting hotter (the largest the result can be) and refused when correcting cooler, where that would understate the loss.`,
  source: 'IEEE C57.12.90 load-loss temperature correction; IEC 60076-1 clause 11.4 (from memory)',
  args: [
    pk,
    measuredAt,
    referenceTemperature,
    i2rPart,
    ...temperatureConstant,
  ],
  result: { type: 'number', unit: 'W' },
  compute: loadLossAtTemperature,
});
