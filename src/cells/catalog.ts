/**
 * Every cell function, group by group in the order the docs list them, by name within a group.
 * Adding a function is adding its declaration to a group file and that file to this list.
 */
import type { CellFunctionDecl } from './declaration';
import * as current from './functions/current';
import * as efficiency from './functions/efficiency';
import * as energy from './functions/energy';
import * as losses from './functions/losses';
import * as ratio from './functions/ratio';

const groups: Record<string, CellFunctionDecl>[] = [ratio, current, losses, efficiency, energy];

// A module namespace lists its exports sorted by name (webpack and native ESM do), but vitest's
// module runner lists them in source order: sort explicitly so functions.json, the bundle and
// the tests all see one order.
export const catalog: readonly CellFunctionDecl[] = groups.flatMap((g) =>
  Object.keys(g)
    .sort()
    .map((k) => g[k]!),
);

export const NAMESPACE = 'XFMR';

export function findFunction(name: string): CellFunctionDecl | undefined {
  const upper = name.toUpperCase().replace(/^XFMR\./, '');
  return catalog.find((d) => d.name === upper);
}
