/**
 * Excel entry: registers every declaration with the custom-functions runtime. It runs both in the
 * JavaScript-only runtime on Windows (no DOM) and in the browser runtime on Mac and the web, so it
 * touches nothing but the CustomFunctions global.
 */
import { adapt, type ErrorKind, prebuiltCopies } from '../cells/adapter';
import { catalog } from '../cells/catalog';

function excelError(kind: ErrorKind, message: string): CustomFunctions.Error {
  // Excel shows a custom message only with #VALUE! and #N/A.
  if (kind === 'VALUE') return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidValue, message);
  if (kind === 'NA') return new CustomFunctions.Error(CustomFunctions.ErrorCode.notAvailable, message);
  return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidNumber);
}

/**
 * Copies of the adapter's column loop, one for each `each` function, written into the bundle by
 * the build (webpack.config.js): the add-in compiles no code at run time, and a loop shared by
 * every function runs them slower (see DEVELOPERS.md, the column loop).
 */
declare const FLUXBOOK_COLUMN_LOOPS: readonly unknown[] | undefined;
const options = { copyLoop: prebuiltCopies(typeof FLUXBOOK_COLUMN_LOOPS === 'undefined' ? [] : FLUXBOOK_COLUMN_LOOPS) };

for (const decl of catalog) {
  const cellFunction = adapt(decl, excelError, options);
  const arity = decl.args.length;
  CustomFunctions.associate(decl.name, (...args: unknown[]) => {
    try {
      // The runtime may append an invocation object; only the declared arguments are ours.
      return cellFunction(...args.slice(0, arity));
    } catch (error) {
      // A fault of ours, not of the input: say so rather than leave the cell blank.
      const reason = error instanceof Error ? error.message : String(error);
      return [[new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidValue, `Fluxbook internal error in ${decl.name}: ${reason}`)]];
    }
  });
}
