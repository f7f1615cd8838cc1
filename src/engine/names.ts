/**
 * Function names as a file stores them and as the engine reads them.
 *
 * Excel saves a call to an add-in function under a `_xldudf_` name with the namespace dot turned
 * into an underscore: `=XFMR.EFF(B2, …)` is stored as `_xldudf_XFMR_EFF(B2, …)` (from memory;
 * docs/references.md, Workbook format). Functions added after the original file format are stored with an `_xlfn.`
 * prefix (some with `_xlfn._xlws.`), e.g. `_xlfn.STDEV.S` ("Formulas added in Excel 2010 and
 * later", rust_xlsxwriter docs, rustxlsxwriter.github.io/formulas/future_functions.html; the
 * `_xlws.` part from memory). The engine knows such functions by their plain names.
 *
 * Reading, both our stored form and plain `XFMR.` names are accepted; writing, our calls are
 * always given Excel's form so a workbook saved here and opened in Excel with the add-in keeps
 * working. Only calls to functions of the catalog are translated: an unknown name is left as it
 * is (the engine shows #NAME? for it) so nothing in a formula is lost. Text inside string
 * literals and quoted sheet names is never touched.
 */
import { catalog, formulaName, NAMESPACE } from '../cells/catalog';

/** `_xldudf_XFMR_EFF` for XFMR.EFF (dots of a name become underscores too). */
export function storedName(name: string): string {
  return `_xldudf_${NAMESPACE}_${name.replace(/\./g, '_')}`;
}

const byStoredName = new Map<string, string>();
const byFormulaName = new Map<string, string>();
for (const decl of catalog) {
  byStoredName.set(storedName(decl.name).toUpperCase(), formulaName(decl));
  byFormulaName.set(formulaName(decl), storedName(decl.name));
}

/** Runs `edit` on the parts of a formula outside "string literals" and 'quoted sheet names'. */
export function outsideQuotes(formula: string, edit: (code: string) => string): string {
  let out = '';
  let i = 0;
  while (i < formula.length) {
    const quote = formula.indexOf('"', i);
    const apostrophe = formula.indexOf("'", i);
    const next = quote < 0 ? apostrophe : apostrophe < 0 ? quote : Math.min(quote, apostrophe);
    if (next < 0) {
      out += edit(formula.slice(i));
      break;
    }
    out += edit(formula.slice(i, next));
    const mark = formula[next]!;
    let end = next + 1;
    for (;;) {
      const close = formula.indexOf(mark, end);
      if (close < 0) {
        end = formula.length;
        break;
      }
      if (formula[close + 1] === mark) {
        end = close + 2; // a doubled quote stands for one inside the literal
        continue;
      }
      end = close + 1;
      break;
    }
    out += formula.slice(next, end);
    i = end;
  }
  return out;
}

// A function name: not preceded by a name character, followed by "(".
const STORED_CALL = /(?<![\w.])_xldudf_([A-Za-z0-9_]+)(?=\s*\()/gi;
const FUTURE_PREFIX = /(?<![\w.])_xlfn\.(?:_xlws\.)?(?=[A-Za-z])/gi;
const PLAIN_CALL = new RegExp(`(?<![\\w.])${NAMESPACE}\\.([A-Za-z0-9_.]+)(?=\\s*\\()`, 'gi');

/**
 * An `_xldudf_XFMR_…` name the catalog does not have, as the engine's `XFMR.…`, so it shows #NAME?
 * ("Function name XFMR.NOSUCH not recognized") rather than failing to parse: the engine's names
 * may not start with "_". The stored formula is written back as it was read.
 */
function unknownOfOurs(rest: string): string | undefined {
  const prefix = `${NAMESPACE}_`;
  return rest.toUpperCase().startsWith(prefix) && rest.length > prefix.length ? formulaName(rest.slice(prefix.length).toUpperCase()) : undefined;
}

/**
 * Another add-in's `_xldudf_…` call as a name the engine parses and does not know, so that cell
 * alone gets #NAME? (and formulas reading it the error value), not a parse error: XLDUDF.ACME_FLOW.
 */
export const OTHER_ADDIN_PREFIX = 'XLDUDF.';
const otherAddIn = (rest: string): string => `${OTHER_ADDIN_PREFIX}${rest.toUpperCase()}`;

/** The formula as the engine reads it: our stored names back to XFMR.NAME, `_xlfn.` dropped. */
export function toEngineFormula(stored: string): string {
  return outsideQuotes(stored, (code) =>
    code
      .replace(STORED_CALL, (whole, rest: string) => byStoredName.get(`_XLDUDF_${rest.toUpperCase()}`) ?? unknownOfOurs(rest) ?? otherAddIn(rest))
      .replace(FUTURE_PREFIX, '')
      .replace(PLAIN_CALL, (whole, rest: string) => (byFormulaName.has(formulaName(rest.toUpperCase())) ? formulaName(rest.toUpperCase()) : whole)),
  );
}

/** The formula as Excel stores it: calls to our functions under their `_xldudf_` names. */
export function toStoredFormula(formula: string): string {
  return outsideQuotes(formula, (code) =>
    code.replace(PLAIN_CALL, (whole, rest: string) => byFormulaName.get(formulaName(rest.toUpperCase())) ?? whole),
  );
}

/** True when the formula calls one of our functions, in either form. */
export function callsOurFunctions(formula: string): boolean {
  let found = false;
  outsideQuotes(formula, (code) => {
    if (!found) {
      for (const m of code.matchAll(PLAIN_CALL)) if (byFormulaName.has(formulaName(m[1]!.toUpperCase()))) found = true;
      for (const m of code.matchAll(STORED_CALL)) if (byStoredName.has(`_XLDUDF_${m[1]!.toUpperCase()}`)) found = true;
    }
    return code;
  });
  return found;
}
