/**
 * Every cell function, grouped as the docs list them. Adding a function is adding its
 * declaration to a group file and that file to this list.
 */
import type { CellFunctionDecl } from './declaration';
import * as compliance from './functions/compliance';
import * as cost from './functions/cost';
import * as current from './functions/current';
import * as efficiency from './functions/efficiency';
import * as energy from './functions/energy';
import * as harmonics from './functions/harmonics';
import * as loading from './functions/loading';
import * as losses from './functions/losses';
import * as ratio from './functions/ratio';
import * as regulation from './functions/regulation';
import * as rules from './functions/rules';
import * as sizing from './functions/sizing';
import * as testReports from './functions/testReports';
import * as thermal from './functions/thermal';

// COMPLIES (compliance) stays last: it checks a unit against the rules listed just before it.
const groups: Record<string, CellFunctionDecl>[] = [
  ratio,
  current,
  sizing,
  losses,
  harmonics,
  efficiency,
  energy,
  thermal,
  loading,
  cost,
  regulation,
  rules,
  testReports,
  compliance,
];

// Alphabetical within each group: module namespaces enumerate in different orders under different
// loaders, and the generated files must not change with the loader.
export const catalog: readonly CellFunctionDecl[] = groups.flatMap((g) =>
  Object.values(g).sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)),
);

export const NAMESPACE = 'XFMR';

/** The name a function has in formulas, XFMR.EFF for EFF: the one place the namespace is joined on. */
export function formulaName(decl: { readonly name: string } | string): string {
  return `${NAMESPACE}.${typeof decl === 'string' ? decl : decl.name}`;
}

/** The declaration of EFF, eff or XFMR.EFF. */
export function findFunction(name: string): CellFunctionDecl | undefined {
  const upper = name.toUpperCase();
  const prefix = formulaName('');
  const bare = upper.startsWith(prefix) ? upper.slice(prefix.length) : upper;
  return catalog.find((d) => d.name === bare);
}
