/**
 * Standard kVA ratings and the next standard rating for a load. Tables are typed once, with the
 * source of every row; a load beyond the largest rating of a series has no row (#N/A).
 */
import { NotInTableError, shown } from './errors';
import { fractionBelowOne, positive } from './guards';

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
 * IEEE C57.12.00 preferred continuous kVA ratings, single-phase (from memory), as listed by the
 * secondary source electrical-engineering-portal.com/electrical-thumb-rules-you-must-follow-part-5
 * ("Standard Size of Transformer"). That page writes the ratings above 1000 kVA in a shortened
 * form (1.25, 1.66, 3.33, 6.6, 8.3, 16.6, 20.8, 33.33); they are read here as the thirds-of-a-
 * three-phase-bank values 1250, 1667, 3333, 6667, 8333, 16 667, 20 833, 33 333 kVA (from memory).
 */
const US_SINGLE_PHASE: readonly number[] = [
  5, 10, 15, 25, 37.5, 50, 75, 100, 167, 250, 333, 500, 833, 1250, 1667, 2500, 3333, 5000, 6667, 8333, 10000, 12500,
  16667, 20833, 25000, 33333,
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
    source: 'IEEE C57.12.00 preferred kVA ratings, single-phase (from memory; secondary source electrical-engineering-portal.com, electrical thumb rules part 5)',
    ratingsKva: US_SINGLE_PHASE,
  },
  US3: {
    id: 'US3',
    title: 'IEEE C57.12.00 three-phase',
    source: 'IEEE C57.12.00 preferred kVA ratings, three-phase (from memory; secondary source electrical-engineering-portal.com, electrical thumb rules part 5)',
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
