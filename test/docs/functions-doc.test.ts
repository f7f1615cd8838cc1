import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { catalog } from '../../src/cells/catalog';
import { isError } from '../../scripts/doc-sheets';
import { anchor, FUNCTIONS_DOC, functionsDoc, functionsDocModel } from '../../scripts/functions-doc';

describe('docs/functions.md', () => {
  const started = performance.now();
  const model = functionsDocModel();
  const generated = functionsDoc(model);
  const seconds = (performance.now() - started) / 1000;

  it('matches the declarations and what the engine computes (run `npm run docs` when this fails)', () => {
    expect(readFileSync(FUNCTIONS_DOC, 'utf8')).toBe(generated);
  });

  it('is generated in well under 10 s, the same way twice', () => {
    expect(seconds).toBeLessThan(10);
    expect(functionsDoc(functionsDocModel())).toBe(generated);
  });

  it('has a section, a contents link, an example and an error example for every function', () => {
    for (const d of catalog) {
      expect(generated).toContain(`\n### XFMR.${d.name}\n`);
      expect(generated).toContain(`](#${anchor(`XFMR.${d.name}`)})`);
    }
    expect(model.functions.map((f) => f.decl.name)).toEqual(catalog.map((d) => d.name));
    expect(generated.match(/\*\*Example\.\*\*/g)).toHaveLength(catalog.length);
    expect(generated.match(/\*\*Error example\.\*\*/g)).toHaveLength(catalog.length);
  });

  it('computes every example without an error and every error example as a #VALUE! with a message', () => {
    for (const f of model.functions) {
      expect(f.computed.result.flat().some(isError), f.decl.name).toBe(false);
      const e = f.computedError.result[0]![0]!;
      expect(isError(e) && e.error === '#VALUE!' && e.message.startsWith('argument '), f.decl.name).toBe(true);
    }
  });

  it('shows the engine’s value, e.g. XFMR.EFF(1000, 1400, 10500, 0.5) = 500 / (500 + 1.4 + 2.625) (textbook standard)', () => {
    const eff = model.functions.find((f) => f.decl.name === 'EFF')!;
    expect(eff.computed.formula).toBe('=XFMR.EFF(1000, 1400, 10500, 0.5)');
    expect(eff.computed.result[0]![0]).toBeCloseTo(500 / (500 + 1.4 + 2.625), 12);
    expect(generated).toContain('`=XFMR.EFF(1000, 1400, 10500, 0.5)` → **0.992014** (fraction)');
  });

  it('lays series out as cells and references them', () => {
    const allday = model.functions.find((f) => f.decl.name === 'ALLDAY')!;
    expect(allday.computed.formula).toBe('=XFMR.ALLDAY(1000, 1400, 10500, A1:A6, B1, C1)');
    expect(allday.example.holds.map((h) => `${h.range} ${h.arg.name}`)).toEqual(['A1:A6 loads', 'B1 pfs', 'C1 hours']);
  });

  it('carries the safety caution, the units and how ranges broadcast and spill', () => {
    expect(generated).toMatch(/planning estimates/);
    expect(generated).toMatch(/qualified engineer/);
    expect(generated).toMatch(/local electrical codes and the[\s>]+manufacturer's data[\s>]+govern/);
    expect(generated).toContain('## Units');
    expect(generated).toContain('## Ranges: broadcast and spill');
  });
});
