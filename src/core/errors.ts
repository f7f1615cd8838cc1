/**
 * The ways a computation can refuse, kept apart so the cell layer can map each to the Excel
 * error that fits:
 *  - InputError: the user gave an argument outside its domain -> #VALUE! with the message.
 *  - NoAnswerError: the inputs are valid but have no numeric answer -> #NUM!.
 *  - NotInTableError: a standard's table has no row for the input -> #N/A with the message.
 * A programmer mistake is an ordinary Error and is never caught as one of these.
 *
 * Every message about one argument reads `argument <name>: <reason>`, built by argumentMessage
 * alone, so the core, the guards and the cell adapter word a fault the same way.
 */
export function argumentMessage(name: string, reason: string): string {
  return `argument ${name}: ${reason}`;
}

/** A refusal that names the argument at fault. */
abstract class ArgumentFault extends Error {
  constructor(
    readonly argument: string,
    readonly reason: string,
  ) {
    super(argumentMessage(argument, reason));
  }
}

export class InputError extends ArgumentFault {
  override readonly name = 'InputError';
}

export class NotInTableError extends ArgumentFault {
  override readonly name = 'NotInTableError';
}

export class NoAnswerError extends Error {
  override readonly name = 'NoAnswerError';
  constructor(readonly reason: string) {
    super(reason);
  }
}

/** Formats a number for a message the way a person would read it back from the cell. */
export function shown(value: number): string {
  if (Number.isNaN(value)) return 'not a number';
  if (!Number.isFinite(value)) return value > 0 ? 'infinity' : '-infinity';
  return String(Number(value.toPrecision(6)));
}
