/**
 * functions.json for Excel, generated from the declarations (never hand-edited). Every parameter
 * is typed `any` with matrix dimensionality so that a cell, a literal or a whole range reaches our
 * adapter, which gives the precise #VALUE! message for text, blanks or bad numbers.
 */
import type { ArgDecl, CellFunctionDecl } from './declaration';

export const SAFETY_NOTE =
  'Planning estimate: verify with a qualified engineer; local electrical codes and the manufacturer’s data govern.';

export function argumentDescription(a: ArgDecl): string {
  const unit = a.unit ? ` [${a.unit}]` : '';
  const dflt = a.default !== undefined ? ` Default ${typeof a.default === 'string' ? `"${a.default}"` : a.default}.` : '';
  return `${a.help}${unit}${dflt}`;
}

export interface FunctionsJson {
  functions: {
    id: string;
    name: string;
    description: string;
    result: { type: string; dimensionality: string };
    parameters: { name: string; description: string; type: string; dimensionality: string; optional?: boolean }[];
  }[];
}

export function functionsJson(catalog: readonly CellFunctionDecl[]): FunctionsJson {
  return {
    functions: catalog.map((d) => ({
      id: d.name,
      name: d.name,
      description: `${d.help} Result in ${d.result.unit}. ${SAFETY_NOTE}`,
      result: { type: 'any', dimensionality: 'matrix' },
      parameters: d.args.map((a) => ({
        name: a.name,
        description: argumentDescription(a),
        type: 'any',
        dimensionality: 'matrix',
        ...(a.optional ? { optional: true } : {}),
      })),
    })),
  };
}
