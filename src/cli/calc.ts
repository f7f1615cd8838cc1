/** `fluxbook calc IN.xlsx --out OUT.xlsx [--json]`: recalculates a workbook into a new file. */
import type ExcelJS from 'exceljs';
import { calculate, loadWorkbook, readCells, storeResults, WorkbookError, type FormulaResult } from '../engine/xlsx';
import { checkOutput, readInput, UsageError, writeAtomically } from './files';
import { progress, wantsBar, type Progress } from './progress';

export interface CalcOptions {
  readonly out: string;
  readonly json?: boolean;
  readonly overwrite?: boolean;
}

export interface CalcSummary {
  readonly formulas: number;
  readonly ours: number;
  readonly errors: number;
  readonly results: FormulaResult[];
}

function checkXlsxName(path: string, what: string): void {
  if (!/\.xlsx$/i.test(path)) throw new UsageError(`${path}: the ${what} must be an .xlsx file`);
}

/**
 * Recalculates an exceljs workbook in place, then saves it through `save`, with a progress bar
 * when the workbook is big (the bar stays up while the file is written, which takes as long).
 */
export async function recalculateAndSave(workbook: ExcelJS.Workbook, save: () => Promise<void>): Promise<CalcSummary> {
  const read = readCells(workbook);
  const ours = read.formulas.filter((f) => f.ours).length;
  const bar: Progress = progress(wantsBar(read.formulas.length, read.longestRange));
  try {
    bar.stage('calculating', ours);
    const hf = calculate(read, () => bar.tick());
    let results: FormulaResult[];
    try {
      bar.stage('storing results', read.formulas.length);
      results = storeResults(workbook, read, hf, () => bar.tick());
    } finally {
      hf.destroy();
    }
    bar.stage('writing the workbook', 1);
    await save();
    bar.tick();
    const errors = results.filter((r) => r.value !== null && typeof r.value === 'object').length;
    return { formulas: results.length, ours, errors, results };
  } finally {
    bar.stop();
  }
}

export async function calc(input: string, options: CalcOptions): Promise<CalcSummary> {
  checkXlsxName(options.out, 'output');
  const bytes = await readInput(input);
  await checkOutput(options.out, { overwrite: Boolean(options.overwrite), notSameAs: input });
  let workbook: ExcelJS.Workbook;
  try {
    workbook = await loadWorkbook(bytes);
  } catch (error) {
    if (error instanceof WorkbookError) throw new UsageError(`${input}: ${error.message}`);
    throw error;
  }
  return recalculateAndSave(workbook, () => writeAtomically(options.out, (tmp) => workbook.xlsx.writeFile(tmp), { overwrite: Boolean(options.overwrite) }));
}
