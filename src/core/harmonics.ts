/**
 * Harmonic heating of windings.
 *
 * Harmonic loss factor, IEEE C57.110 (definition as quoted in IEEE Xplore document 4523666):
 *   F_HL = Σ (I_h/I_1)² h² / Σ (I_h/I_1)²   — the eddy loss the spectrum causes, per unit of the
 * eddy loss of a sinusoidal current of the same rms. Any unit for the currents will do: the ratio
 * does not depend on it.
 *
 * K-factor, UL 1561/1562 (definition as quoted in the encyclopedia entry on K-factor):
 *   K = Σ I_h(pu)² h²,  I_h in per unit of the transformer's rated rms current
 * — so K depends on how heavily the unit is loaded; a spectrum scaled to an rms of 1 per unit (the
 * load at rated current) gives K = F_HL.
 *
 * Largest per-unit current under that spectrum (IEEE C57.110 dry-type method, from memory):
 *   I_max = √((1 + P_EC-R) / (1 + F_HL·P_EC-R)),  P_EC-R the winding eddy loss at rated current in
 * per unit of the rated I²R loss — the current at which the winding loss density at its worst spot
 * equals the rated one.
 */
import { InputError, NoAnswerError, shown } from './errors';
import { eachOf, nonEmpty, nonNegative, positive } from './guards';

/** Above this rms (per unit of rated current) the currents are almost surely amperes. */
const MAX_RMS_PER_UNIT = 2;

interface Spectrum {
  readonly orders: Float64Array;
  readonly currents: Float64Array;
  /** Σ I_h² and Σ I_h² h² in the units given. */
  readonly squares: number;
  readonly weighted: number;
}

function checkedSpectrum(orders: Float64Array, currents: Float64Array): Spectrum {
  eachOf('orders', nonEmpty('orders', orders), (name, h) => {
    positive(name, h);
    if (h < 1) throw new InputError(name, `harmonic order ${shown(h)} is below the fundamental (1)`);
    return h;
  });
  eachOf('currents', nonEmpty('currents', currents), nonNegative);
  if (orders.length !== currents.length) {
    throw new InputError('currents', `has ${currents.length} values but orders has ${orders.length}; give one current per order`);
  }
  let squares = 0;
  let weighted = 0;
  for (let i = 0; i < orders.length; i++) {
    const h = orders[i]!;
    const ih2 = currents[i]! * currents[i]!;
    squares += ih2;
    weighted += ih2 * h * h;
  }
  if (squares === 0) throw new NoAnswerError('every current is zero: the spectrum has no loss to weigh');
  return { orders, currents, squares, weighted };
}

/** F_HL = Σ I_h² h² / Σ I_h², IEEE C57.110. */
export function harmonicLossFactor(orders: Float64Array, currents: Float64Array): number {
  const s = checkedSpectrum(orders, currents);
  return s.weighted / s.squares;
}

/**
 * What the currents of a K-factor spectrum are measured against. "rated": per unit of the
 * transformer's rated current, as the UL definition takes them. "fundamental": per unit (or per
 * cent) of the fundamental, as harmonic meters report them; such a spectrum says nothing of the
 * load, so it is scaled to an rms of 1 per unit — the spectrum at rated current, the duty a
 * K-rated transformer is specified for — and K is then the same number as HLF.
 */
export type SpectrumBasis = 'rated' | 'fundamental';

/** K = Σ I_h² h², I_h per unit of rated rms current (UL 1561/1562). */
export function kFactor(orders: Float64Array, currents: Float64Array, basis: SpectrumBasis = 'rated'): number {
  const s = checkedSpectrum(orders, currents);
  if (basis === 'fundamental') return s.weighted / s.squares;
  const rms = Math.sqrt(s.squares);
  if (rms > MAX_RMS_PER_UNIT) {
    throw new InputError(
      'currents',
      `their rms is ${shown(rms)} per unit of rated current; give the currents per unit of the rated current (e.g. 0.2 or 20%), not in A — or, for a spectrum in per cent of the fundamental as meters report it, give basis "fundamental"`,
    );
  }
  return s.weighted;
}

/** Largest per-unit current the winding carries with that harmonic content (IEEE C57.110). */
export function harmonicDerating(hlf: number, eddyPerUnit: number): number {
  const f = positive('hlf', hlf);
  if (f < 1) throw new InputError('hlf', `a harmonic loss factor is 1 or more (got ${shown(f)})`);
  const pec = nonNegative('eddy_pu', eddyPerUnit);
  return Math.sqrt((1 + pec) / (1 + f * pec));
}
