/** Function names between Excel's stored form and the engine's (docs/references.md, Workbook format). */
import { describe, expect, it } from 'vitest';
import { catalog } from '../../src/cells/catalog';
import { callsOurFunctions, storedName, toEngineFormula, toStoredFormula } from '../../src/engine/names';

describe('names of our functions in a file', () => {
  it('Excel stores XFMR.EFF as _xldudf_XFMR_EFF', () => {
    expect(storedName('EFF')).toBe('_xldudf_XFMR_EFF');
    expect(toStoredFormula('XFMR.EFF(B2,C2,D2,0.5)')).toBe('_xldudf_XFMR_EFF(B2,C2,D2,0.5)');
    expect(toEngineFormula('_xldudf_XFMR_EFF(B2,C2,D2,0.5)')).toBe('XFMR.EFF(B2,C2,D2,0.5)');
  });

  it('every function of the catalog goes there and back', () => {
    for (const d of catalog) {
      const f = `SUM(XFMR.${d.name}(A1), 1)`;
      expect(toEngineFormula(toStoredFormula(f))).toBe(f);
      expect(toStoredFormula(f)).toContain(`_xldudf_XFMR_${d.name}(`);
    }
  });

  it('plain names in any case are read; the stored form is always written', () => {
    expect(toEngineFormula('xfmr.eff(1,2,3,4)')).toBe('XFMR.EFF(1,2,3,4)');
    expect(toStoredFormula('xfmr.Eff(1,2,3,4)')).toBe('_xldudf_XFMR_EFF(1,2,3,4)');
    expect(toEngineFormula('_XLDUDF_XFMR_EFF(1,2,3,4)')).toBe('XFMR.EFF(1,2,3,4)');
  });

  it('leaves string literals and quoted sheet names alone', () => {
    const f = `CONCAT("XFMR.EFF(", 'XFMR.EFF(x'!A1, "it""s _xldudf_XFMR_EFF(")`;
    expect(toStoredFormula(f)).toBe(f);
    expect(toEngineFormula(f)).toBe(f);
  });

  it('gives names that are not ours a form the engine parses and does not know (#NAME? there)', () => {
    // Another add-in's call reaches the engine as XLDUDF.OTHER_F: #NAME? in that cell, not a parse error.
    expect(toEngineFormula('_xldudf_OTHER_F(2)')).toBe('XLDUDF.OTHER_F(2)');
    // An XFMR name we do not have reaches the engine as XFMR.NOSUCH, which answers #NAME?.
    expect(toEngineFormula('_xldudf_XFMR_NOSUCH(1)+_xldudf_OTHER_F(2)')).toBe('XFMR.NOSUCH(1)+XLDUDF.OTHER_F(2)');
    expect(toStoredFormula('XFMR.NOSUCH(1)+MYXFMR.EFF(2)+XFMR.EFFX(3)')).toBe('XFMR.NOSUCH(1)+MYXFMR.EFF(2)+XFMR.EFFX(3)');
    expect(callsOurFunctions('XFMR.NOSUCH(1)')).toBe(false);
    expect(callsOurFunctions('1+_xldudf_XFMR_EFF(1,2,3,4)')).toBe(true);
  });

  it('drops the _xlfn. prefix of newer native functions for the engine', () => {
    expect(toEngineFormula('_xlfn.STDEV.S(A1:A3)+_xlfn._xlws.SORT(B1:B3)')).toBe('STDEV.S(A1:A3)+SORT(B1:B3)');
  });
});
