/** The catalog as a whole: every function once, COMPLIES last, and every sample computes. */
import { describe, expect, it } from 'vitest';
import { CellError } from '../../src/cells/adapter';
import { catalog, findFunction } from '../../src/cells/catalog';
import { cellFunction } from '../support/cells';

describe('catalog', () => {
  it('holds every function once, with COMPLIES last', () => {
    const names = catalog.map((d) => d.name);
    expect(new Set(names).size).toBe(names.length);
    expect(names[names.length - 1]).toBe('COMPLIES');
    expect(findFunction('xfmr.size')?.name).toBe('SIZE');
  });
  it.each(catalog.map((d) => [d.name, d] as const))('%s: its sample arguments compute a value, not an error', (name, d) => {
    const out = cellFunction(name)(...d.args.map((a) => (Array.isArray(a.sample) ? a.sample.map((x) => [x]) : a.sample)));
    for (const row of out) for (const v of row) expect(v, d.name).not.toBeInstanceOf(CellError);
  });
});
