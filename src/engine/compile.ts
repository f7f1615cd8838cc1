/**
 * Code generation for the engine's adapter: Node compiles a function from its source text, so
 * each cell function can run its own copy of the adapter's column loop (`AdaptOptions.copyLoop`).
 * The add-in does not import this module; its bundle builds no code at run time.
 */

import { checkedCopy } from '../cells/adapter';

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

/**
 * A copy of a self-contained function, compiled from its own source. V8 keeps one set of type
 * feedback per function in the source, shared by every closure of it; a loop that calls many
 * different computes through one call site learns that the site is megamorphic and stops inlining
 * any of them, which costs the column loop about half its speed. A copy per adapted function keeps
 * its call site to one compute. Where compiling fails, or the copy does not pass `works`, the
 * shared function is returned: the same results, slower.
 */
export function ownCopy<F extends (...args: never[]) => unknown>(
  f: F,
  label: string,
  works: (copy: F) => boolean,
  compile: (source: string) => unknown = compileFunctionSource,
): F {
  let copy: unknown;
  try {
    // The label makes each source distinct: V8 caches compiled code by source text, and two
    // copies of one text would share their feedback again.
    copy = compile(`return (${f.toString()});\n//# sourceURL=fluxbook/${encodeURIComponent(label)}`);
  } catch {
    return f;
  }
  return checkedCopy(copy, works, f);
}
