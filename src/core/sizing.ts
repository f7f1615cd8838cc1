/**
 * Standard kVA ratings and the next standard rating for a load. Tables are typed once, with the
 * source of every row; a load beyond the largest rating of a series has no row (#N/A).
 */
import { InputError, NoAnswerError, NotInTableError, shown } from './errors';
import { anyNumber, fractionBelowOne, positive } from './guards';

export type RatingSeriesId = 'US1' | 'US3' | 'IEC';

export interface RatingSeries {
  readonly id: RatingSeriesId;
  readonly title: string;
  /** Where the ratings come from; it applies to every row of the series. */
  readonly source: string;
  /** Ascending, kVA. */
  readonly ratingsKva: readonly number[];
}

/**
 * IEEE C57.12.00 preferred continuous kVA ratings, single-phase (from memory). Each is one third
 * of a rating of the three-phase series below, rounded to the kVA — a bank of three single-phase
 * units makes that three-phase rating (common practice) — so 20 000 kVA (a third of 60 000) is a
 * rating and 20 833 is not. The distribution sizes 10 … 833 kVA, 667 included, are the kVA rows of
 * the DOE single-phase tables of 10 CFR 431.196. The secondary source of the series
 * (docs/references.md, Currents) prints the larger ones as 1.25, 1.66, 2.5, 3.33, 5.0, 6.6, 8.3,
 * 10, 12.5, 16.6, 20.8 (sic), 25, 33.33 thousand kVA, and leaves out 667.
 */
const US_SINGLE_PHASE: readonly number[] = [
  5, 10, 15, 25, 37.5, 50, 75, 100, 167, 250, 333, 500, 667, 833, 1250, 1667, 2500, 3333, 5000, 6667, 8333, 10000,
  12500, 16667, 20000, 25000, 33333,
];

/**
 * IEEE C57.12.00 preferred continuous kVA ratings, three-phase (from memory), as listed by the same
 * secondary source; its "3.7 MVA" is read as 3750 kVA (from memory). The page also lists 3, 5 and
 * 9 kVA, which are small dry-type sizes outside the distribution range this series serves; the
 * series starts at 15 kVA, the smallest rating the DOE tables of 10 CFR 431.196 use.
 */
const US_THREE_PHASE: readonly number[] = [
  15, 30, 45, 75, 112.5, 150, 225, 300, 500, 750, 1000, 1500, 2000, 2500, 3750, 5000, 7500, 10000, 12000, 15000, 20000,
  25000, 30000, 37500, 50000, 60000, 75000, 100000,
];

/**
 * The R10 series of preferred numbers (ISO 3): one decade in ten steps, each the rounded value of
 * 10^(k/10). IEC 60076-1: "For transformers up to 20 MVA, values of rated power should preferably
 * be taken from the R10 series given in ISO 3" (clause quoted at faqs.tips, "why distribution
 * transformers are rated at 25 kVA and 63 kVA", which also lists 10, 12.5, 16, 20, 25, 31.5, 40,
 * 50, 63, 80, 100).
 */
export const R10_MANTISSAS: readonly number[] = [1.0, 1.25, 1.6, 2.0, 2.5, 3.15, 4.0, 5.0, 6.3, 8.0];

function r10Ratings(fromKva: number, toKva: number): number[] {
  const out: number[] = [];
  for (let decade = fromKva; decade <= toKva; decade *= 10) {
    for (const m of R10_MANTISSAS) {
      const kva = Math.round(m * decade * 1000) / 1000;
      if (kva >= fromKva && kva <= toKva) out.push(kva);
    }
  }
  return out;
}

export const RATING_SERIES: Readonly<Record<RatingSeriesId, RatingSeries>> = {
  US1: {
    id: 'US1',
    title: 'IEEE C57.12.00 single-phase',
    source: 'IEEE C57.12.00 preferred kVA ratings, single-phase: thirds of the three-phase series (from memory; secondary source in docs/references.md, Currents)',
    ratingsKva: US_SINGLE_PHASE,
  },
  US3: {
    id: 'US3',
    title: 'IEEE C57.12.00 three-phase',
    source: 'IEEE C57.12.00 preferred kVA ratings, three-phase (from memory; secondary source in docs/references.md, Currents)',
    ratingsKva: US_THREE_PHASE,
  },
  IEC: {
    id: 'IEC',
    title: 'IEC 60076-1 preferred ratings (R10 series)',
    source: 'IEC 60076-1 preferred values of rated power up to 20 MVA: the R10 series of ISO 3, here from 10 kVA to 20 000 kVA',
    ratingsKva: r10Ratings(10, 20000),
  },
};

/** The smallest standard rating of the series that carries load × (1 + margin). */
export function nextStandardRating(loadKva: number, margin: number, seriesId: RatingSeriesId): number {
  const load = positive('load_kva', loadKva);
  const m = fractionBelowOne('margin', margin);
  const series = RATING_SERIES[seriesId];
  const needed = load * (1 + m);
  // A rating equal to the need is enough; the tolerance absorbs rounding in load × (1 + margin).
  const rating = series.ratingsKva.find((r) => r >= needed * (1 - 1e-12));
  if (rating === undefined) {
    const largest = series.ratingsKva[series.ratingsKva.length - 1]!;
    throw new NotInTableError(
      'load_kva',
      `${shown(needed)} kVA${m > 0 ? ` (with the margin)` : ''} is beyond the largest ${series.title} rating, ${shown(largest)} kVA; split the load between units`,
    );
  }
  return rating;
}

/**
 * Years until a peak growing by `growth` a year, compounded, reaches `limitKva`:
 * n = ln(limit / peak) / ln(1 + growth) — the same n as a spreadsheet's NPER(growth, 0, −peak,
 * limit). 0 when the peak is already at or above the limit; no answer when the peak never gets
 * there (growth 0 or negative).
 */
export function yearsToLimit(peakKva: number, growth: number, limitKva: number): number {
  const peak = positive('peak_kva', peakKva);
  const limit = positive('limit_kva', limitKva);
  anyNumber('growth', growth);
  if (growth >= 1) {
    throw new InputError('growth', `${shown(growth)} is 100 % a year or more; type it as a percentage, e.g. ${shown(growth)}% or ${shown(growth / 100)}`);
  }
  if (growth <= -1) throw new InputError('growth', `must be above -100 % a year (got ${shown(growth)})`);
  if (peak >= limit) return 0;
  if (growth <= 0) {
    throw new NoAnswerError(`a peak of ${shown(peak)} kVA ${growth === 0 ? 'that does not grow' : 'that falls'} never reaches ${shown(limit)} kVA`);
  }
  return Math.log(limit / peak) / Math.log1p(growth);
}
