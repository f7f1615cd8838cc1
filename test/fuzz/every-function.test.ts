/**
 * Property-based fuzzing of every cell function, driven by the declarations (no hand list): the
 * arguments are drawn from awkward numbers, text, logical values, blanks and ranges of mismatched
 * shapes, mixed with values near each argument's valid sample so that the core is reached too.
 * Whatever arrives, the adapter must not throw, no cell may hold NaN or ±Infinity, and every error
 * cell must be an error value whose message names an argument of the function.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { adapt, CellError, plainErrors } from '../../src/cells/adapter';
import { catalog } from '../../src/cells/catalog';
import type { ArgDecl, CellFunctionDecl } from '../../src/cells/declaration';

/** Calls per run, shared out over the catalog: at least 100,000 in total. */
export const TOTAL_CALLS = 100_000;
const runsEach = Math.ceil(TOTAL_CALLS / catalog.length);

const awkwardNumber = fc.oneof(
  fc.constantFrom(0, -0, -1, 1, 1e-300, -1e-300, 1e300, -1e300, Number.NaN, Infinity, -Infinity, 0.5, 1.5, 100, 12, 11),
  fc.double(),
  fc.integer({ min: -1000, max: 1000 }),
);
const awkwardCell = fc.oneof(
  awkwardNumber,
  fc.string({ maxLength: 8 }),
  fc.constantFrom('Dyn11', 'YNd1', 'Yy0', 'ONAN', 'IEC', 'IEEE', 'Cu', 'Al', 'TRUE', 'x', ' ', '5%'),
  fc.boolean(),
  fc.constantFrom(null, undefined, ''),
);

/** A value near the argument's sample: scaled, negated or itself. */
function nearSample(a: ArgDecl): fc.Arbitrary<unknown> {
  const s = Array.isArray(a.sample) ? a.sample[0] : a.sample;
  if (typeof s !== 'number') return fc.constant(s);
  return fc.oneof(
    fc.constant(s),
    fc.double({ min: 0.01, max: 3, noNaN: true }).map((k) => s * k),
    fc.constant(-s),
    fc.integer({ min: -3, max: 12 }),
  );
}

function cellFor(a: ArgDecl): fc.Arbitrary<unknown> {
  return fc.oneof({ weight: 3, arbitrary: nearSample(a) }, { weight: 2, arbitrary: awkwardCell });
}

function argumentFor(a: ArgDecl): fc.Arbitrary<unknown> {
  const cell = cellFor(a);
  if (a.series) {
    return fc.oneof(
      fc.constant((a.sample as readonly number[]).map((v) => [v])),
      fc.array(cell, { minLength: 0, maxLength: 24 }).map((v) => v.map((x) => [x])),
      fc.array(fc.array(cell, { minLength: 2, maxLength: 2 }), { minLength: 1, maxLength: 6 }),
      cell,
    );
  }
  return fc.oneof(
    { weight: 4, arbitrary: cell },
    {
      weight: 2,
      arbitrary: fc
        .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 3 }))
        .chain(([r, c]) => fc.array(fc.array(cell, { minLength: c, maxLength: c }), { minLength: r, maxLength: r })),
    },
    // Edge shapes: empty ranges, 1-D arrays and ragged rows.
    { weight: 1, arbitrary: fc.constantFrom([], [[]], [1, 2], [[1], [2, 3]]) },
  );
}

function checkResult(decl: CellFunctionDecl, out: unknown): void {
  expect(Array.isArray(out)).toBe(true);
  const names = decl.args.map((a) => a.name);
  for (const row of out as unknown[][]) {
    expect(Array.isArray(row)).toBe(true);
    for (const v of row) {
      if (typeof v === 'number') {
        expect(Number.isFinite(v), `${decl.name} returned ${v}`).toBe(true);
      } else if (v instanceof CellError) {
        if (v.kind === 'NUM') {
          expect(typeof v.message).toBe('string');
        } else {
          expect(
            names.some((n) => v.message.includes(`argument ${n}`)),
            `${decl.name}: "${v.message}" names no argument of ${names.join(', ')}`,
          ).toBe(true);
        }
      } else {
        expect(['boolean', 'string'].includes(typeof v), `${decl.name} returned ${String(v)}`).toBe(true);
      }
    }
  }
}

describe(`fuzzing every cell function (${TOTAL_CALLS} calls in all)`, () => {
  it.each(catalog.map((d) => [d.name, d] as const))('%s never throws and never returns a non-finite number', (_name, decl) => {
    const call = adapt(decl, plainErrors);
    fc.assert(
      fc.property(fc.tuple(...decl.args.map(argumentFor)), (args) => {
        checkResult(decl, call(...args));
      }),
      { numRuns: runsEach },
    );
  });
});
