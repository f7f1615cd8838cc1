import { altitudeDerating, type AltitudeCooling, type AltitudeQuantity, type AltitudeStandard } from '../../core/altitude';
import { nextStandardRating, yearsToLimit } from '../../core/sizing';
import { blankable } from '../arguments';
import { choice, inGroup, num } from '../declaration';

const { each } = inGroup('Current and power');

export const SIZE = each({
  name: 'SIZE',
  help: 'Next standard rating that carries the load with the margin: the smallest rating ≥ load_kva × (1 + margin) in the series "US1" (IEEE single-phase, 5 … 33,333 kVA), "US3" (IEEE three-phase, 15 … 100,000 kVA) or "IEC" (R10 series, 10 … 20,000 kVA).',
  source: 'IEEE C57.12.00 preferred kVA ratings (from memory; single-phase checked against the DOE rows of 10 CFR 431.196 and the three-phase series); IEC 60076-1 R10 preferred ratings',
  args: [
    num('load_kva', 'kVA', 'Load to carry, in kVA (kW / power factor).', 640),
    num('margin', 'fraction', 'Spare capacity to add, e.g. 20%; below 100 %.', 0.2, { default: 0 }),
    choice('series', 'Rating series: "US1", "US3" or "IEC".', { options: ['US1', 'US3', 'IEC'], default: 'US3' }),
  ],
  result: { type: 'number', unit: 'kVA' },
  compute: nextStandardRating,
});

export const ALTDERATE = each({
  name: 'ALTDERATE',
  help: 'Allowance for a site above 1,000 m. quantity "kva" (IEEE, the default there): the share of nameplate kVA the unit may carry, 1 − rate × (altitude − 1000)/100 with rate 0.4 % (ONAN), 0.5 % (ONAF, OFAF, ODAF), 0.3 % (dry AN), 0.5 % (dry AF). quantity "rise" (IEC 60076-2, the default there): kelvin to take off the temperature-rise limits, 1 K per started 400 m (ONAN) or 250 m (forced cooling). Planning estimate: to be verified by a qualified engineer; the manufacturer’s data govern.',
  source: 'IEEE C57.12.00 / C57.91 altitude correction (liquid-immersed rates from memory; dry-type 0.3 % as stated by manufacturers’ FAQs); IEC 60076-2 reduced rise limits as quoted by a manufacturer’s FAQ',
  args: [
    num('altitude_m', 'm', 'Site altitude above sea level, in metres.', 2200),
    choice('cooling', '"ONAN", "ONAF", "OFAF", "ODAF" (liquid-immersed) or "AN", "AF" (dry-type).', {
      options: ['ONAN', 'ONAF', 'OFAF', 'ODAF', 'AN', 'AF'] as const satisfies readonly AltitudeCooling[],
      aliases: { OF: 'OFAF', OD: 'ODAF' },
      default: 'ONAN',
    }),
    choice('standard', '"IEEE" (a kVA factor) or "IEC" (reduced rise limits).', {
      options: ['IEEE', 'IEC'] as const satisfies readonly AltitudeStandard[],
      default: 'IEEE',
    }),
    blankable(
      choice('quantity', '"kva" for the rating factor (IEEE) or "rise" for the reduction of the rise limits in K (IEC); blank takes the one the standard gives.', {
        options: ['kva', 'rise'] as const satisfies readonly AltitudeQuantity[],
      }),
    ),
  ],
  result: { type: 'number', unit: 'per unit or K' },
  compute: (h, cooling, standard, quantity) => altitudeDerating(h, cooling, standard, quantity ?? (standard === 'IEEE' ? 'kva' : 'rise')),
});

export const YEARSTOLIMIT = each({
  name: 'YEARSTOLIMIT',
  help: 'Years until a peak load growing by growth a year (compounded) reaches limit_kva: ln(limit_kva / peak_kva) / ln(1 + growth); 0 if it is there already, #NUM! if it never gets there.',
  source: 'compound growth, n = ln(limit / peak) / ln(1 + g) (common practice; the same n as NPER)',
  args: [
    num('peak_kva', 'kVA', 'This year’s peak load.', 820),
    num('growth', 'fraction', 'Growth of the peak a year, e.g. 3%.', 0.03),
    num('limit_kva', 'kVA', 'The load that calls for a larger unit: nameplate kVA, or the loading limit you plan to.', 1000),
  ],
  result: { type: 'number', unit: 'years' },
  compute: yearsToLimit,
});
