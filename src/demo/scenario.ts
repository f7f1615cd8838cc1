/**
 * The demo scenario: "Fernhill Works", a fictional light-industrial campus with 14 pad-mounted
 * units, and three fictional offers for a new one. Every name and number here is invented: ratings
 * of 500–2500 kVA at 12,470 V to 480 V or 208 V (Dyn1), losses of the order of today's efficient
 * distribution units, and ratio-test readings within a few tenths of a percent of nameplate, two
 * of them outside ±0.5 %. Each unit has an invented guarantee its test report is checked against:
 * most pass; FH-02 passes each loss but not the total, FH-07 fails its losses, FH-10 its impedance
 * and FH-14 its no-load loss. The offers are named by letter only so no name can resemble a real firm.
 */
import { turnsRatio } from '../core/ratio';
import type { Cooling } from '../core/thermal';

export interface FleetUnit {
  readonly id: string;
  readonly location: string;
  readonly kva: number;
  readonly hvV: number;
  readonly lvV: number;
  readonly vectorGroup: string;
  /** Test report: no-load loss and load loss at 85 °C, W; impedance as a fraction. */
  readonly p0W: number;
  readonly pkW: number;
  readonly z: number;
  /** How far the invented ratio-test reading lies from nameplate (fraction). */
  readonly ratioOffset: number;
  /** The guarantee the test report is checked against: losses in W (load loss at 85 °C), impedance as a fraction. */
  readonly guaranteed: { readonly p0W: number; readonly pkW: number; readonly z: number };
}

const unit = (
  id: string,
  location: string,
  kva: number,
  lvV: number,
  p0W: number,
  pkW: number,
  z: number,
  ratioOffset: number,
  guaranteed: FleetUnit['guaranteed'],
): FleetUnit => ({
  id,
  location,
  kva,
  hvV: 12_470,
  lvV,
  vectorGroup: 'Dyn1',
  p0W,
  pkW,
  z,
  ratioOffset,
  guaranteed,
});

export const FLEET: readonly FleetUnit[] = [
  unit('FH-01', 'Assembly Hall A', 2000, 480, 1790, 14_200, 0.0575, 0.0011, { p0W: 1800, pkW: 14_500, z: 0.0575 }),
  unit('FH-02', 'Assembly Hall B', 2000, 480, 1840, 14_650, 0.0575, -0.0008, { p0W: 1700, pkW: 13_000, z: 0.0575 }),
  unit('FH-03', 'Press Shop', 2500, 480, 2160, 16_900, 0.0575, 0.0019, { p0W: 2200, pkW: 17_000, z: 0.0575 }),
  unit('FH-04', 'Paint Line', 1500, 480, 1470, 11_700, 0.0575, -0.0062, { p0W: 1500, pkW: 12_000, z: 0.0575 }),
  unit('FH-05', 'Tool Room', 750, 480, 870, 6_750, 0.0575, 0.0004, { p0W: 900, pkW: 7_000, z: 0.0575 }),
  unit('FH-06', 'Compressor House', 1000, 480, 1060, 8_550, 0.0575, -0.0015, { p0W: 1100, pkW: 8_600, z: 0.0575 }),
  unit('FH-07', 'Boiler House', 1000, 480, 1420, 11_300, 0.0575, 0.0027, { p0W: 1100, pkW: 8_600, z: 0.0575 }),
  unit('FH-08', 'Warehouse North', 750, 480, 890, 6_900, 0.0575, 0.0009, { p0W: 900, pkW: 7_000, z: 0.0575 }),
  unit('FH-09', 'Warehouse South', 750, 480, 845, 6_600, 0.0575, -0.0003, { p0W: 900, pkW: 7_000, z: 0.0575 }),
  unit('FH-10', 'Dispatch Yard', 500, 480, 640, 5_150, 0.05, 0.0071, { p0W: 650, pkW: 5_200, z: 0.0575 }),
  unit('FH-11', 'Test Laboratory', 1500, 480, 1430, 11_400, 0.0575, -0.0021, { p0W: 1500, pkW: 12_000, z: 0.0575 }),
  unit('FH-12', 'Canteen and Offices', 500, 208, 615, 5_050, 0.05, 0.0012, { p0W: 650, pkW: 5_200, z: 0.05 }),
  unit('FH-13', 'Data Room', 1000, 480, 1035, 8_400, 0.0575, 0.0006, { p0W: 1100, pkW: 8_600, z: 0.0575 }),
  unit('FH-14', 'Site Lighting', 500, 208, 660, 5_300, 0.05, -0.0035, { p0W: 570, pkW: 5_200, z: 0.05 }),
];

/** The unit whose year of hourly loading the second workbook models. */
export const YEAR_UNIT = FLEET[2]!;
export const YEAR_POWER_FACTOR = 0.92;
export const YEAR_SEED = 20_250_101;
/** A seed of its own, so the loads stay the same year whether or not the weather is drawn. */
export const AMBIENT_SEED = 20_250_102;
export const HOURS = 8760;
/** The cooling the year's thermal formulas name: a pad-mounted unit, oil natural, air natural. */
export const YEAR_COOLING: Cooling = 'ONAN';

/** The year unit's heat-run report (invented): rated top-oil rise and hot-spot gradient, K. */
export const YEAR_HEAT_RUN = { topOilRise: 52, hotSpotGradient: 24 } as const;

/** What a turns-ratio test set would show: three decimals. */
export function measuredRatio(u: FleetUnit): number {
  return Math.round(turnsRatio(u.hvV, u.lvV, u.vectorGroup) * (1 + u.ratioOffset) * 1000) / 1000;
}

export const INVENTED = 'Fernhill Works is fictional; every unit, reading, load and temperature here is invented demo data.';

export interface Offer {
  readonly name: string;
  readonly price: number;
  /** No-load loss at 20 °C and load loss at 55 °C (the DOE test method's reference temperatures), W. */
  readonly p0W: number;
  readonly pkW: number;
}

export const OFFERS: readonly Offer[] = [
  { name: 'Offer A', price: 21_800, p0W: 690, pkW: 7_500 },
  { name: 'Offer B', price: 18_900, p0W: 980, pkW: 9_800 },
  { name: 'Offer C', price: 25_400, p0W: 450, pkW: 7_400 },
];

/** The buyer's evaluation policy (invented): what a watt of loss is worth over the unit's life. */
export const EVALUATION = {
  kva: 1000,
  priceKwh: 0.12,
  rate: 0.06,
  years: 25,
  lossFactor: 0.35,
  peakLoad: 0.8,
} as const;

export const BIDS_INVENTED = 'Fernhill Works and these offers are fictional; every price and loss here is invented demo data.';
