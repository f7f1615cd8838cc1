/**
 * Every cell function, in the order the docs list them. Adding a function is adding its
 * declaration to a group file and that file to this list.
 */
import type { CellFunctionDecl } from './declaration';
import * as current from './functions/current';
import * as efficiency from './functions/efficiency';
import * as energy from './functions/energy';
import * as losses from './functions/losses';
import * as ratio from './functions/ratio';
import * as thermal from './functions/thermal';

const groups: Record<string, CellFunctionDecl>[] = [ratio, current, losses, efficiency, energy, thermal];

export const catalog: readonly CellFunctionDecl[] = groups.flatMap((g) => Object.values(g));

export const NAMESPACE = 'XFMR';

export function findFunction(name: string): CellFunctionDecl | undefined {
  const upper = name.toUpperCase().replace(/^XFMR\./, '');
  return catalog.find((d) => d.name === upper);
}
