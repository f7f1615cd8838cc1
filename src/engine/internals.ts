/**
 * Every read of HyperFormula's private API, in one place (hyperformula 3.5.0; checked by
 * test/engine/internals.test.ts so an upgrade that moves them fails loudly):
 *  - a formula's vertex in the dependency graph (`dependencyGraph.getCell`) holds the size of the
 *    array it spills (`width`, `height`, ArrayFormulaVertex) and its parsed formula (`formula`);
 *  - a function plugin evaluates its argument ASTs (`evaluateAst`), predicts their array size
 *    (`arraySizeForAst`) and runs the shared argument handling (`runFunction`), all members of
 *    FunctionPlugin that its typings leave out.
 */
import type { ArraySize, FunctionMetadata, HyperFormula, SimpleCellAddress } from 'hyperformula';

export type State = { formulaAddress: SimpleCellAddress; arraysFlag: boolean; formulaVertex?: unknown };

/** The members of a FunctionPlugin instance the plugin uses. */
export interface PluginInternals {
  evaluateAst(ast: unknown, state: State): unknown;
  arraySizeForAst(ast: unknown, state: State): ArraySize;
  runFunction(args: unknown[], state: State, metadata: FunctionMetadata, fn: (...a: unknown[]) => unknown): unknown;
  dependencyGraph: { getCell(address: SimpleCellAddress): unknown };
}

type Vertex = { width?: number; height?: number; cellAddress?: SimpleCellAddress; formula?: unknown } | undefined;

const vertexOf = (graph: { getCell(a: SimpleCellAddress): unknown }, address: SimpleCellAddress): Vertex => graph.getCell(address) as Vertex;

/** The size of the array a formula cell spills, 1×1 for a single value. */
export function arraySize(hf: HyperFormula, address: SimpleCellAddress): { rows: number; cols: number } {
  if (!hf.isCellPartOfArray(address)) return { rows: 1, cols: 1 };
  const graph = (hf as unknown as { dependencyGraph: { getCell(a: SimpleCellAddress): unknown } }).dependencyGraph;
  const vertex = vertexOf(graph, address);
  if (vertex === undefined || typeof vertex.width !== 'number' || typeof vertex.height !== 'number') return { rows: 1, cols: 1 };
  const corner = vertex.cellAddress;
  if (corner === undefined || corner.row !== address.row || corner.col !== address.col) return { rows: 1, cols: 1 };
  return { rows: vertex.height, cols: vertex.width };
}

/** The parsed formula and reserved size of the formula at `address`, as the plugin sees it. */
export function formulaVertex(plugin: PluginInternals, address: SimpleCellAddress): { formula: unknown; rows: number; cols: number } | undefined {
  const vertex = vertexOf(plugin.dependencyGraph, address);
  if (vertex === undefined) return undefined;
  const sized = typeof vertex.width === 'number' && typeof vertex.height === 'number';
  return { formula: vertex.formula, rows: sized ? vertex.height! : 1, cols: sized ? vertex.width! : 1 };
}
