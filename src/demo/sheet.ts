/** Pieces shared by the demo workbooks. */
import ExcelJS from 'exceljs';

/** A new workbook as the demo writes them. */
export function demoWorkbook(title: string): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Fluxbook demo';
  wb.title = title;
  return wb;
}

/** Bold labels across row 1. */
export function header(ws: ExcelJS.Worksheet, labels: readonly string[]): void {
  const row = ws.getRow(1);
  labels.forEach((label, i) => (row.getCell(i + 1).value = label));
  row.font = { bold: true };
}
