/** Calling a cell function by name from a test, as a formula would, with the stand-in error values. */
import { expect } from 'vitest';
import { adapt, CellError, type CellFunction, plainErrors } from '../../src/cells/adapter';
import { findFunction } from '../../src/cells/catalog';

/** XFMR.<name> as a formula sees it, returning whole results with the stand-in error values. */
export function cellFunction(name: string): CellFunction {
  const decl = findFunction(name);
  if (decl === undefined) throw new Error(`no cell function ${name}`);
  return adapt(decl, plainErrors);
}

/** The whole result of XFMR.<name> called with plain values (a range is an array of rows). */
export function xfmrRange(name: string, ...args: unknown[]): unknown[][] {
  return cellFunction(name)(...args);
}

/** The first (often the only) cell of XFMR.<name>'s result. */
export function xfmr(name: string, ...args: unknown[]): unknown {
  return xfmrRange(name, ...args)[0]![0];
}

/** The first cell of a result. */
export const firstCell = (result: unknown[][]): unknown => result[0]![0];

/** A cell, or the first cell of a result, which must be an error value. */
export function errorOf(result: unknown[][] | unknown): CellError {
  const cell = Array.isArray(result) ? firstCell(result as unknown[][]) : result;
  expect(cell).toBeInstanceOf(CellError);
  return cell as CellError;
}

/** A column range of the values. */
export const column = (values: readonly number[]): number[][] => values.map((v) => [v]);
