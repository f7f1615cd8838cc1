/**
 * The two ways a computation can refuse, kept apart so the cell layer can map each to the Excel
 * error that fits (see DESIGN.md, "Spreadsheet conventions"):
 *  - InputError: the user gave an argument outside its domain -> #VALUE! with the message.
 *  - NoAnswerError: the inputs are valid but have no numeric answer -> #NUM!.
 *  - NotInTableError: a standard's table has no row for the input -> #N/A with the message.
 * A programmer mistake is an ordinary Error and is never caught as one of these.
 */
export class InputError extends Error {
  constructor(
    readonly argument: string,
    readonly reason: string,
  ) {
    super(`argument ${argument}: ${reason}`);
    this.name = 'InputError';
  }
}

export class NoAnswerError extends Error {
  constructor(readonly reason: string) {
    super(reason);
    this.name = 'NoAnswerError';
  }
}

export class NotInTableError extends Error {
  constructor(
    readonly argument: string,
    readonly reason: string,
  ) {
    super(`argument ${argument}: ${reason}`);
    this.name = 'NotInTableError';
  }
}

/** Formats a number for a message the way a person would read it back from the cell. */
export function shown(value: number): string {
  if (Number.isNaN(value)) return 'not a number';
  if (!Number.isFinite(value)) return value > 0 ? 'infinity' : '-infinity';
  return String(Number(value.toPrecision(6)));
}
