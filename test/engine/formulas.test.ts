import { describe, expect, it } from 'vitest';
import { shiftFormula } from '../../src/engine/formulas';

// A shared formula as it reads in another cell of its group (ECMA-376 Part 1 §18.3.1.40,
// `t="shared"`): relative references move with the cell, absolute ones stay.
describe('a shared formula moved to another cell of its group', () => {
  it('moves relative cells and ranges, keeps absolute ones, and leaves text in quotes alone', () => {
    expect(shiftFormula('XFMR.EFF(A2,$B$2,C$2,$D2)', 3, 1)).toBe('XFMR.EFF(B5,$B$2,D$2,$D5)');
    expect(shiftFormula('SUM(A2:B3)+Sheet2!C4+"A2"', 1, 0)).toBe('SUM(A3:B4)+Sheet2!C5+"A2"');
  });

  it('moves whole columns across and whole rows down, each end unless it is absolute', () => {
    expect(shiftFormula('XFMR.ELOSS(B:B,C:C)+SUM($A:B)', 5, 2)).toBe('XFMR.ELOSS(D:D,E:E)+SUM($A:D)');
    expect(shiftFormula('SUM(2:3)+SUM($1:4)+SUM(Sheet2!A:A)', 2, 1)).toBe('SUM(4:5)+SUM($1:6)+SUM(Sheet2!B:B)');
    // Filled down, a whole column stays the same column; filled across, a whole row the same row.
    expect(shiftFormula('SUM(B:B)*SUM(2:2)', 10, 0)).toBe('SUM(B:B)*SUM(12:12)');
  });

  it('gives #REF! to a reference moved off the sheet', () => {
    expect(shiftFormula('A1+SUM(A:B)', -1, 0)).toBe('#REF!+SUM(A:B)');
    expect(shiftFormula('SUM(A:B)', 0, -1)).toBe('SUM(#REF!)');
    expect(shiftFormula('SUM(XFD:XFD)', 0, 1)).toBe('SUM(#REF!)');
  });
});
