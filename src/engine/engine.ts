/**
 * The embedded engine: HyperFormula with the catalog registered, configured the way a workbook
 * from Excel expects. Formulas here use the engine's names (XFMR.EFF); the Excel file form
 * (_xldudf_XFMR_EFF) is translated in names.ts.
 */
import { HyperFormula, type ConfigParams, type RawCellContent, type SerializedNamedExpression, type SimpleCellAddress } from 'hyperformula';
import { registerCatalog, withSession, type CalcSession } from './functions';
import { arraySize } from './internals';

/** Excel's sheet size: 1,048,576 rows × 16,384 columns (XFD). */
export const EXCEL_MAX_ROWS = 1_048_576;
export const EXCEL_MAX_COLUMNS = 16_384;

export const ENGINE_CONFIG: Partial<ConfigParams> = {
  // HyperFormula is used under the GNU GPL v3, as Fluxbook is (see README).
  licenseKey: 'gpl-v3',
  // The default of 40,000 rows is less than a 15-minute year (35,040 steps) plus a 10,000-row fleet.
  maxRows: EXCEL_MAX_ROWS,
  maxColumns: EXCEL_MAX_COLUMNS,
  // Array arithmetic is explicit: off for native formulas, as in a legacy Excel formula; our own
  // functions switch it on for their arguments (enableArrayArithmeticForArguments), and array
  // formulas read from a file are wrapped in ARRAYFORMULA (xlsx.ts).
  useArrayArithmetic: false,
  // Numbers come out with 15 significant digits, as Excel keeps them, not the default 11.
  precisionRounding: 14,
};

export type Sheets = Record<string, RawCellContent[][]>;

/** How often the formulas whose results changed size are entered again before giving up. */
const RESIZE_PASSES = 4;

export interface EngineOptions {
  /** Called once per evaluation of one of our functions. */
  readonly onCall?: () => void;
  /** Workbook-level names (Price_kWh = Inputs!$B$2). */
  readonly namedExpressions?: SerializedNamedExpression[];
}

const key = (a: SimpleCellAddress): string => `${a.sheet}:${a.row}:${a.col}`;

/**
 * Builds and calculates a workbook. Block results whose size could not be known when their formula
 * was parsed (arguments not computed yet) are entered again until every result fits its room.
 */
export function createEngine(sheets: Sheets, options: EngineOptions = {}): HyperFormula {
  registerCatalog();
  let pending = new Map<string, SimpleCellAddress>();
  const session: CalcSession = {
    resized: (address) => void pending.set(key(address), { ...address }),
    called: options.onCall,
  };
  return withSession(session, () => {
    const hf = HyperFormula.buildFromSheets(sheets, ENGINE_CONFIG, options.namedExpressions);
    for (let pass = 0; pass < RESIZE_PASSES && pending.size > 0; pass++) {
      const again = [...pending.values()];
      pending = new Map();
      hf.batch(() => {
        for (const address of again) {
          const formula = hf.getCellFormula(address);
          if (formula !== undefined) hf.setCellContents(address, [[formula]]);
        }
      });
    }
    return hf;
  });
}

/** Evaluates one formula on an otherwise empty sheet, or on `sheet` given as rows from A1. */
export function evaluateFormula(formula: string, sheet: RawCellContent[][] = []): unknown {
  const rows = sheet.map((r) => [...r]);
  const at = rows.length;
  rows.push([formula]);
  const hf = createEngine({ Sheet1: rows });
  try {
    const address = { sheet: 0, row: at, col: 0 };
    const anchor = hf.getCellValue(address);
    const size = arraySize(hf, address);
    if (size.rows === 1 && size.cols === 1) return anchor;
    return hf.getRangeValues({ start: address, end: { sheet: 0, row: at + size.rows - 1, col: size.cols - 1 } });
  } finally {
    hf.destroy();
  }
}
