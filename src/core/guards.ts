/**
 * Domain checks shared by every core function. Each returns the value it checked so a body can
 * read `const s = positive('kva', kva)`. The messages form one catalogue, so the same fault reads
 * the same way in every function.
 */
import { InputError, shown } from './errors';

// Each guard's passing path is one or two comparisons, small enough for the compiler to inline
// into the hot loops of the core; the message is built only on refusal, out of line.
/** Refuses an argument: every guard and every core check throws through here. */
export function refuse(name: string, reason: string): never {
  throw new InputError(name, reason);
}

function notFinite(name: string, value: number): never {
  return refuse(name, `must be a finite number (got ${shown(Number(value))})`);
}

function finite(name: string, value: number): number {
  if (typeof value === 'number' && value - value === 0) return value;
  return notFinite(name, value);
}

export function anyNumber(name: string, value: number): number {
  return finite(name, value);
}

export function positive(name: string, value: number): number {
  if (value > 0 && value < Infinity) return value;
  finite(name, value);
  return refuse(name, `must be greater than 0 (got ${shown(value)})`);
}

export function nonNegative(name: string, value: number): number {
  if (value >= 0 && value < Infinity) return value;
  finite(name, value);
  return refuse(name, `must be 0 or more (got ${shown(value)})`);
}

/** A fraction from 0 to 1 inclusive (load factor, loss factor, a weighting). */
export function atMostOne(name: string, value: number): number {
  finite(name, value);
  if (!(value >= 0 && value <= 1)) refuse(name, `must be from 0 to 1 (got ${shown(value)})`);
  return value;
}

/** A per-unit load: 0 (no load) upward; overloads above 1 are legitimate. */
export function perUnitLoad(name: string, value: number): number {
  return nonNegative(name, value);
}

/**
 * A per-unit load with a ceiling, where a model holds only so far (the loading guides' thermal
 * models beyond a few times rated current). A value far above it is most often a load typed in
 * kVA, so the message says how to fix it.
 */
export function perUnitLoadAtMost(name: string, value: number, max: number): number {
  perUnitLoad(name, value);
  if (value > max) {
    refuse(name, `${shown(value)} per unit is above ${shown(max)}, beyond the model's range; give the load as kVA ÷ nameplate kVA (1 = full load)`);
  }
  return value;
}

/** Power factor, 0 exclusive to 1 inclusive (a zero power factor delivers no energy to rate). */
export function powerFactor(name: string, value: number): number {
  if (value > 0 && value <= 1) return value;
  finite(name, value);
  return refuse(name, `power factor must be above 0 and at most 1 (got ${shown(value)})`);
}

/**
 * A per-unit impedance typed as an Excel percentage (5.75 % arrives as 0.0575). A value of 1 or
 * more is almost always a percentage typed without the % sign, so the message says how to fix it.
 */
export function perUnitImpedance(name: string, value: number): number {
  finite(name, value);
  if (value >= 1) {
    refuse(name, `${shown(value)} is 100 % or more; type it as a percentage, e.g. ${shown(value)}% or ${shown(value / 100)}`);
  }
  if (!(value > 0)) refuse(name, `must be greater than 0 % (got ${shown(value)})`);
  return value;
}

/** A fraction strictly below 1 (percent resistance, tap step size, tolerance...). */
export function fractionBelowOne(name: string, value: number, allowZero = true): number {
  finite(name, value);
  if (Math.abs(value) >= 1) {
    refuse(name, `${shown(value)} is 100 % or more; type it as a percentage, e.g. ${shown(value)}%`);
  }
  if (allowZero ? value < 0 : value <= 0) {
    refuse(name, `must be ${allowZero ? '0 or more' : 'greater than 0'} (got ${shown(value)})`);
  }
  return value;
}

export function integerBetween(name: string, value: number, low: number, high: number): number {
  finite(name, value);
  if (!Number.isInteger(value) || value < low || value > high) {
    refuse(name, `must be a whole number from ${low} to ${high} (got ${shown(value)})`);
  }
  return value;
}

export function phaseCount(name: string, value: number): 1 | 3 {
  finite(name, value);
  if (value !== 1 && value !== 3) refuse(name, `must be 1 or 3 phases (got ${shown(value)})`);
  return value;
}

/** Every step of a series checked with the same rule; a refusal names the step (1-based). */
export function eachOf(name: string, values: Float64Array, check: (n: string, v: number) => number): Float64Array {
  for (let i = 0; i < values.length; i++) {
    try {
      check(name, values[i]!);
    } catch (error) {
      if (error instanceof InputError) refuse(`${name} (step ${i + 1})`, error.reason);
      throw error;
    }
  }
  return values;
}

/** A series given as one value (held constant) or as one value per step of the profile. */
export function oneOrSameLength(name: string, values: Float64Array, steps: number, profileName: string): Float64Array {
  if (values.length !== 1 && values.length !== steps) {
    refuse(name, `has ${values.length} values; give one value or one per step of ${profileName} (${steps})`);
  }
  return values;
}

export function nonEmpty(name: string, values: Float64Array): Float64Array {
  if (values.length === 0) refuse(name, 'is empty; give at least one value');
  return values;
}

/** A positive number no larger than `max` (hours in a year, a plausible ceiling on a count...). */
export function positiveAtMost(name: string, value: number, max: number): number {
  finite(name, value);
  if (!(value > 0 && value <= max)) {
    refuse(name, `must be greater than 0 and at most ${shown(max)} (got ${shown(value)})`);
  }
  return value;
}

/** How option text is compared: case, surrounding blanks and the separator (blank, _ or -) do not matter. */
function optionKey(text: string): string {
  return String(text).trim().toLowerCase().replace(/[\s_-]+/g, '-');
}

/**
 * A matcher for a fixed set of text options, built once: it returns the option as the set spells
 * it, so callers compare against one spelling only, or undefined. `aliases` maps other accepted
 * spellings (a short form, the other standard's name) to an option.
 */
export function optionMatcher<T extends string>(options: readonly T[], aliases: Readonly<Record<string, T>> = {}): (text: string) => T | undefined {
  const byKey = new Map<string, T>();
  for (const [alias, option] of Object.entries(aliases)) byKey.set(optionKey(alias), option);
  for (const option of options) byKey.set(optionKey(option), option);
  return (text) => byKey.get(optionKey(text));
}

/** The reason text is refused: `"xyz" is not one of "ONAN", "ONAF", "OF", "OD" or "OFAF", "ODAF"`. */
export function notAnOption(text: string, options: readonly string[], aliases: Readonly<Record<string, string>> = {}): string {
  const quoted = (list: readonly string[]) => list.map((o) => `"${o}"`).join(', ');
  const others = Object.keys(aliases);
  return `"${String(text)}" is not one of ${quoted(options)}${others.length === 0 ? '' : ` or ${quoted(others)}`}`;
}

/** One of a fixed set of text options (see optionMatcher); anything else is refused. */
export function oneOf<T extends string>(name: string, text: string, options: readonly T[], aliases: Readonly<Record<string, T>> = {}): T {
  return optionMatcher(options, aliases)(text) ?? refuse(name, notAnOption(text, options, aliases));
}

/** A number from low to high inclusive; `what` names the quantity in the message ("an ambient temperature"). */
export function within(name: string, value: number, low: number, high: number, unit: string, what = 'the value'): number {
  finite(name, value);
  if (!(value >= low && value <= high)) {
    refuse(name, `${shown(value)} ${unit} is out of range; ${what} must be from ${shown(low)} to ${shown(high)} ${unit}`);
  }
  return value;
}

/** Ambient air temperature where transformers are installed: -60 to 60 °C (plausibility bound). */
export function ambientTemperature(name: string, value: number): number {
  return within(name, value, -60, 60, '°C', 'an ambient temperature');
}
