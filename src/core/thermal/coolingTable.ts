/**
 * Thermal characteristics of oil-immersed transformers, one row per loading method and cooling
 * mode. A row holds everything the steady-state and transient models need; the user may replace
 * the rated top-oil rise, hot-spot gradient and loss ratio with the unit's test-report values.
 *
 * Both guides write the same steady state, with different letters:
 *   top-oil rise  Δθo = Δθor · [(1 + R·K²)/(1 + R)]^x      IEEE: Δθ_TO,R · [(K²R + 1)/(R + 1)]^n
 *   hot-spot rise Δθh = Hgr · K^y                           IEEE: Δθ_H,R · K^(2m)
 * so a row stores the oil exponent x (= IEEE n) and the winding exponent y (= IEEE 2m).
 *
 * Sources and their status (docs/references.md, Loading and aging):
 *  - IEC rows: IEC 60076-7 Table 4, recommended thermal characteristics for the exponential
 *    equations, from memory. The rows are internally
 *    consistent: each reaches 98 °C hot-spot at rated load and 20 °C ambient (20 + Δθor + Hgr),
 *    which the tests check.
 *  - IEEE rows: exponents n and m from the IEEE C57.91 table of exponents for the temperature
 *    equations, from memory. IEEE C57.91 takes the rated rises and the oil time constant from the
 *    unit's own test data (τ_TO = C·Δθ_TO,R / P_T,R); without it these rows use a 65 °C-rise unit's
 *    80 K rated hot-spot rise split 55 K top oil + 25 K gradient (common practice), and borrow the
 *    loss ratio and time constants of the IEC 60076-7 Table 4 row of the same cooling (from memory).
 */

/**
 * The insulation paper a row's rated point is designed around, and so the aging law applied by
 * default: IEEE C57.91 rates 65 °C-rise units on thermally upgraded paper (aging rate 1 at 110 °C);
 * the IEC 60076-7 Table 4 rows reach 98 °C at rated load and 20 °C ambient, the reference of
 * non-upgraded kraft paper (both from memory; the tests check the rated points).
 */
export type Paper = 'upgraded' | 'normal';

/** Cooling modes as IEC 60076-7 groups them; IEEE's OFAF/OFWF are OF, ODAF/ODWF are OD. */
export type Cooling = 'ONAN' | 'ONAF' | 'OF' | 'OD';

/**
 * How the loading is modelled and which table row applies:
 *  - IEEE: IEEE C57.91 clause 7 (two first-order responses, top-oil rise and hot-spot rise).
 *  - IEC: IEC 60076-7 difference equations; ONAN takes the distribution-transformer row, the
 *    other coolings (which the standard gives for power transformers only) the power rows.
 *  - IEC-POWER: IEC 60076-7 with the medium-and-large-power-transformer row for every cooling,
 *    ONAN included.
 */
export type ThermalMethod = 'IEEE' | 'IEC' | 'IEC-POWER';

export interface ThermalCharacteristics {
  readonly method: 'IEEE' | 'IEC';
  readonly cooling: Cooling;
  /** The kind of unit the row describes. */
  readonly unit: 'distribution' | 'power' | 'any';
  /** x (IEC) or n (IEEE): exponent of the top-oil rise on the total-loss ratio. */
  readonly oilExponent: number;
  /** y (IEC) or 2m (IEEE): exponent of the hot-spot gradient on the per-unit load K. */
  readonly windingExponent: number;
  /** R: load loss at rated current over no-load loss. */
  readonly lossRatio: number;
  /** H: hot-spot factor (IEC); already inside hotSpotGradient, kept for reference. */
  readonly hotSpotFactor: number | null;
  /** Δθor (IEC) or Δθ_TO,R (IEEE): top-oil rise over ambient at rated load, K. */
  readonly topOilRise: number;
  /** Hgr = H·gr (IEC) or Δθ_H,R (IEEE): hot-spot rise over top oil at rated load, K. */
  readonly hotSpotGradient: number;
  /** τo: oil time constant, minutes. */
  readonly oilTimeConstant: number;
  /** τw: winding time constant, minutes. */
  readonly windingTimeConstant: number;
  /** IEC thermal model constants; IEEE's clause 7 model is the case k11 = k21 = k22 = 1. */
  readonly k11: number;
  readonly k21: number;
  readonly k22: number;
  /** The paper whose aging law applies unless the unit's own is given (see Paper). */
  readonly paper: Paper;
  /** Hours of normal life at the paper's reference hot-spot, the divisor of a life fraction. */
  readonly normalLifeHours: number;
  readonly source: string;
}

/**
 * Normal insulation life of a well-dried, oxygen-free thermally upgraded paper system at the
 * 110 °C reference hot-spot, by end-of-life criterion: the table IEEE C57.91 and IEC 60076-7 both
 * give (confirmed from a stored transformer-life article quoting the IEC 60076-7 table; docs/references.md).
 */
export const NORMAL_INSULATION_LIFE: readonly { readonly criterion: string; readonly hours: number }[] = [
  { criterion: '50 % retained tensile strength of insulation', hours: 65_000 },
  { criterion: '25 % retained tensile strength of insulation', hours: 135_000 },
  { criterion: '200 retained degree of polymerization in insulation', hours: 150_000 },
  { criterion: 'interpretation of distribution transformer functional life test data', hours: 180_000 },
];

/**
 * The normal life Fluxbook divides by: 180,000 h, the distribution-transformer criterion above, at
 * the paper's own reference hot-spot (110 °C upgraded, 98 °C kraft). The guides print their life
 * table for upgraded paper at 110 °C; for kraft paper the same hours are taken at 98 °C, where its
 * aging rate is 1 (common practice; docs/references.md). A unit's own figure replaces it.
 */
export const NORMAL_LIFE_HOURS = 180_000;

const IEC_TABLE_4 = 'IEC 60076-7 Table 4 (from memory)';

/** The figures of an IEC 60076-7 Table 4 row, in the standard's column order (τo, τw in minutes; Δθor, Hgr in K). */
type Table4Figures = readonly [x: number, y: number, R: number, H: number, τo: number, τw: number, Δθor: number, Hgr: number, k11: number, k21: number, k22: number];

/** An IEC 60076-7 Table 4 row: kraft paper (the table's rated points reach 98 °C) and the normal life. */
function iecRow(cooling: Cooling, unit: 'distribution' | 'power', figures: Table4Figures): ThermalCharacteristics {
  const [oilExponent, windingExponent, lossRatio, hotSpotFactor, oilTimeConstant, windingTimeConstant, topOilRise, hotSpotGradient, k11, k21, k22] = figures;
  const units = unit === 'distribution' ? 'distribution transformers' : 'medium and large power transformers';
  return {
    method: 'IEC', cooling, unit,
    oilExponent, windingExponent, lossRatio, hotSpotFactor, topOilRise, hotSpotGradient, oilTimeConstant, windingTimeConstant, k11, k21, k22,
    paper: 'normal', normalLifeHours: NORMAL_LIFE_HOURS, source: `${IEC_TABLE_4}, ${units}, ${cooling}`,
  };
}

/** IEC 60076-7 Table 4, distribution transformers (ONAN only); figures x, y, R, H, τo, τw, Δθor, Hgr, k11, k21, k22. */
export const IEC_DISTRIBUTION_ONAN: ThermalCharacteristics = iecRow('ONAN', 'distribution', [0.8, 1.6, 5, 1.1, 180, 4, 55, 23, 1.0, 1.0, 2.0]);

/** IEC 60076-7 Table 4, medium and large power transformers; figures as in IEC_DISTRIBUTION_ONAN. */
export const IEC_POWER: Readonly<Record<Cooling, ThermalCharacteristics>> = {
  ONAN: iecRow('ONAN', 'power', [0.8, 1.3, 6, 1.3, 210, 10, 52, 26, 0.5, 2.0, 2.0]),
  ONAF: iecRow('ONAF', 'power', [0.8, 1.3, 6, 1.3, 150, 7, 52, 26, 0.5, 2.0, 2.0]),
  OF: iecRow('OF', 'power', [1.0, 1.3, 6, 1.3, 90, 7, 56, 22, 1.0, 1.3, 1.0]),
  OD: iecRow('OD', 'power', [1.0, 2.0, 6, 1.3, 90, 7, 49, 29, 1.0, 1.0, 1.0]),
};

const IEEE_EXPONENTS = 'IEEE C57.91 exponents n, m (from memory); 55 K + 25 K rated rises (common practice, 65 °C-rise unit)';

/**
 * An IEEE C57.91 clause 7 row: exponents n and m, a 65 °C-rise unit's 55 K + 25 K rated rises, the
 * clause 7 model (k11 = k21 = k22 = 1) on upgraded paper, and the loss ratio and time constants of
 * the IEC 60076-7 Table 4 row `iec` (named `borrowed` in the source).
 */
function ieeeRow(cooling: Cooling, n: number, m: number, iec: ThermalCharacteristics, borrowed: string, exponentsNote = ''): ThermalCharacteristics {
  return {
    method: 'IEEE', cooling, unit: 'any',
    oilExponent: n, windingExponent: 2 * m, lossRatio: iec.lossRatio, hotSpotFactor: null,
    topOilRise: 55, hotSpotGradient: 25, oilTimeConstant: iec.oilTimeConstant, windingTimeConstant: iec.windingTimeConstant,
    k11: 1, k21: 1, k22: 1, paper: 'upgraded', normalLifeHours: NORMAL_LIFE_HOURS, source: `${IEEE_EXPONENTS}${exponentsNote}; R, τo, τw from ${IEC_TABLE_4}, ${borrowed}`,
  };
}

/** IEEE C57.91 clause 7, with the borrowed loss ratio and time constants named in the header. */
export const IEEE_ROWS: Readonly<Record<Cooling, ThermalCharacteristics>> = {
  ONAN: ieeeRow('ONAN', 0.8, 0.8, IEC_DISTRIBUTION_ONAN, 'distribution ONAN'),
  ONAF: ieeeRow('ONAF', 0.9, 0.8, IEC_POWER.ONAF, 'ONAF'),
  OF: ieeeRow('OF', 0.9, 0.8, IEC_POWER.OF, 'OF', ' (non-directed OFAF/OFWF)'),
  OD: ieeeRow('OD', 1.0, 1.0, IEC_POWER.OD, 'OD', ' (directed ODAF/ODWF)'),
};

/** Every row once, for the tests and the docs. */
export const THERMAL_ROWS: readonly ThermalCharacteristics[] = [
  ...Object.values(IEEE_ROWS),
  IEC_DISTRIBUTION_ONAN,
  ...Object.values(IEC_POWER),
];

/** The table row for a method and cooling mode (see ThermalMethod for the IEC ONAN choice). */
export function thermalCharacteristics(method: ThermalMethod, cooling: Cooling): ThermalCharacteristics {
  if (method === 'IEEE') return IEEE_ROWS[cooling];
  if (method === 'IEC' && cooling === 'ONAN') return IEC_DISTRIBUTION_ONAN;
  return IEC_POWER[cooling];
}

