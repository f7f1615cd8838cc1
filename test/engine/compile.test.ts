import { describe, expect, it } from 'vitest';
import { compileFunctionSource, ownCopy } from '../../src/engine/compile';

describe('a copy of a function compiled from its own source (ownCopy)', () => {
  const double = (x: number): number => 2 * x;
  const alwaysWorks = () => true;

  it('compiles a distinct function that answers as the original does', () => {
    const copy = ownCopy(double, 'test.double', alwaysWorks, compileFunctionSource);
    expect(copy).not.toBe(double);
    expect(copy(21)).toBe(42);
  });

  it('keeps the original where the host refuses to compile code (a content security policy)', () => {
    const refuse = () => {
      throw new EvalError('code generation from strings disallowed for this context');
    };
    expect(ownCopy(double, 'test.double', alwaysWorks, refuse)).toBe(double);
  });

  it('keeps the original where the copy fails its check, or names something it cannot see', () => {
    expect(ownCopy(double, 'test.double', () => false, compileFunctionSource)).toBe(double);
    const counted = { n: 0 };
    const instrumented = (x: number): number => (counted.n++, 2 * x);
    expect(ownCopy(instrumented, 'test.instrumented', (copy) => copy(1) === 2, compileFunctionSource)).toBe(instrumented);
  });
});
