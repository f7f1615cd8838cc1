/** The linear interpolation both regulations direct for ratings between the rows of their tables. */
import { NotInTableError, shown } from '../errors';

/**
 * Linear interpolation in a table of ascending kVA rows, as 10 CFR 431.196 directs for ratings
 * between rows ("linear interpolation of the kVA and efficiency values immediately above and
 * below that kVA rating"). A rating outside the first and last row has no value: NotInTableError.
 */
export function interpolate(rows: readonly { readonly kva: number; readonly value: number }[], kva: number, what: string): number {
  const first = rows[0]!;
  const last = rows[rows.length - 1]!;
  if (kva < first.kva || kva > last.kva) {
    throw new NotInTableError('kva', `${shown(kva)} kVA is outside ${what}, which runs from ${shown(first.kva)} to ${shown(last.kva)} kVA`);
  }
  for (let i = 0; i < rows.length; i++) {
    const hi = rows[i]!;
    if (kva === hi.kva) return hi.value;
    if (kva < hi.kva) {
      const lo = rows[i - 1]!;
      return lo.value + ((hi.value - lo.value) * (kva - lo.kva)) / (hi.kva - lo.kva);
    }
  }
  return last.value;
}
