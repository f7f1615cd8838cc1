/**
 * Code generation for the engine's adapter: Node compiles a function from its source text, so
 * each cell function can run its own copy of the adapter's column loop (cells/adapter.ts,
 * `ownCopy`). The add-in does not import this module; its bundle builds no code at run time.
 */

let refused = false;

/** `return (function …)` compiled and run, giving the function; a refusing host is not asked twice. */
export function compileFunctionSource(source: string): unknown {
  if (refused) throw new Error('this host does not compile code');
  try {
    return new Function(source)();
  } catch (error) {
    refused = true;
    throw error;
  }
}
