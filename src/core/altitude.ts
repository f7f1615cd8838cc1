/**
 * Rating and temperature-rise allowances for sites above 1000 m, where thinner air cools less.
 * IEEE (C57.12.00 / C57.91 for liquid-immersed, C57.12.01 for dry-type): the kVA rating is
 * reduced by a fixed share for every 100 m above 1000 m. IEC 60076-2: the temperature-rise limits
 * are reduced instead, by 1 K for every 400 m above 1000 m with natural air cooling (..AN) and
 * every 250 m with forced air (..AF). Sources and their status: docs/references.md, Test reports
 * and short circuit.
 */
import { NotInTableError } from './errors';
import { within } from './guards';

export type AltitudeCooling = 'ONAN' | 'ONAF' | 'OFAF' | 'ODAF' | 'AN' | 'AF';
export type AltitudeStandard = 'IEEE' | 'IEC';
export type AltitudeQuantity = 'kva' | 'rise';

const BASE_ALTITUDE_M = 1000;

/**
 * Per cent of rated kVA lost for every 100 m above 1000 m (IEEE). Liquid-immersed: self-cooled
 * 0.4, forced-air and forced-oil 0.5 (from memory). Dry-type: self-cooled 0.3 (confirmed in
 * manufacturers' statements, docs/references.md), forced-air 0.5 (from memory).
 */
const IEEE_KVA_PERCENT_PER_100M: Readonly<Record<AltitudeCooling, number>> = {
  ONAN: 0.4,
  ONAF: 0.5,
  OFAF: 0.5,
  ODAF: 0.5,
  AN: 0.3,
  AF: 0.5,
};

/** Metres of altitude above 1000 m that cost 1 K of allowed rise (IEC 60076-2). */
const IEC_METRES_PER_KELVIN: Partial<Readonly<Record<AltitudeCooling, number>>> = {
  ONAN: 400,
  ONAF: 250,
  OFAF: 250,
  ODAF: 250,
};

/**
 * "kva": the share of the nameplate rating the unit may carry at the altitude (IEEE), 1 up to
 * 1000 m. "rise": by how many kelvin the temperature-rise limits are reduced for a unit tested at
 * a low-lying factory (IEC 60076-2), 0 up to 1000 m; a started interval counts as a whole one,
 * the reading that never allows more rise than the rule.
 */
export function altitudeDerating(altitudeM: number, cooling: AltitudeCooling, standard: AltitudeStandard, quantity: AltitudeQuantity): number {
  const h = within('altitude_m', altitudeM, -500, 6000, 'm', 'a site altitude');
  const above = Math.max(0, h - BASE_ALTITUDE_M);
  if (standard === 'IEEE') {
    if (quantity === 'rise') {
      throw new NotInTableError('quantity', 'the IEEE rule reduces the kVA rating at altitude; ask for quantity "kva" (or use standard "IEC" for reduced rise limits)');
    }
    return 1 - (IEEE_KVA_PERCENT_PER_100M[cooling] / 100) * (above / 100);
  }
  if (quantity === 'kva') {
    throw new NotInTableError('quantity', 'IEC 60076-2 reduces the temperature-rise limits at altitude, not the rating; ask for quantity "rise" (or use standard "IEEE" for a kVA factor)');
  }
  const metres = IEC_METRES_PER_KELVIN[cooling];
  if (metres === undefined) {
    throw new NotInTableError('cooling', `${cooling} is a dry-type cooling; IEC 60076-2 covers liquid-immersed units, and the dry-type rule (IEC 60076-11) is not held here`);
  }
  return Math.ceil(above / metres - 1e-9);
}

