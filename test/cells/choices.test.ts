/**
 * Text options (choice arguments) are parsed once per cell by the adapter: case, surrounding
 * blanks and the separator do not matter, aliases stand for their option, and unknown text is
 * #VALUE! naming the argument and listing what it takes.
 */
import { describe, expect, it } from 'vitest';
import { catalog } from '../../src/cells/catalog';
import { relativeAgingRate, steadyHotSpot, thermalModel, type Cooling, type ThermalMethod } from '../../src/core/thermal';
import { loadLossAtTemperature } from '../../src/core/losses';
import { doeMinimumEfficiency, euMaximumLoss } from '../../src/core/efficiencyRules';
import { errorOf, xfmr } from '../support/cells';

/** The steady hot-spot of the table row at 30 °C ambient, straight from the core. */
const hotSpotSteady = (load: number, cooling: Cooling, method: ThermalMethod) => steadyHotSpot(thermalModel(method, cooling), load, 30);

describe('cooling', () => {
  const hotspot = (cooling: unknown) => xfmr('HOTSPOT', 1, 30, cooling, null, null, null, 'IEEE');
  it('reads cooling names case-insensitively, with the IEEE and IEC spellings', () => {
    expect(hotspot(' onan ')).toBe(hotSpotSteady(1, 'ONAN', 'IEEE'));
    expect(hotspot('Onaf')).toBe(hotSpotSteady(1, 'ONAF', 'IEEE'));
    for (const of of ['OFAF', 'of', 'OFWF']) expect(hotspot(of)).toBe(hotSpotSteady(1, 'OF', 'IEEE'));
    for (const od of ['ODAF', 'od', 'odwf']) expect(hotspot(od)).toBe(hotSpotSteady(1, 'OD', 'IEEE'));
  });
  it('refuses an unknown cooling, naming cooling and listing the options', () => {
    expect(errorOf(hotspot('AN')).message).toBe('argument cooling: "AN" is not one of "ONAN", "ONAF", "OF", "OD" or "OFAF", "OFWF", "ODAF", "ODWF"');
  });
});

describe('method and paper', () => {
  it('reads the method with any separator, refusing others by name', () => {
    const m = (method: unknown) => xfmr('HOTSPOT', 1.2, 30, 'ONAN', null, null, null, method);
    expect(m('ieee')).toBe(hotSpotSteady(1.2, 'ONAN', 'IEEE'));
    expect(m('iec power')).toBe(hotSpotSteady(1.2, 'ONAN', 'IEC-POWER'));
    expect(m('IEC_POWER')).toBe(m('IEC-POWER'));
    expect(errorOf(m('ANSI')).message).toMatch(/^argument method: "ANSI" is not one of "IEEE", "IEC", "IEC-POWER"$/);
  });
  it('reads the paper kind and its other names, refusing others by name', () => {
    expect(xfmr('AGERATE', 104, 'Thermally upgraded')).toBe(relativeAgingRate(104, 'upgraded'));
    expect(xfmr('AGERATE', 104, 'thermally-upgraded')).toBe(relativeAgingRate(104, 'upgraded'));
    expect(xfmr('AGERATE', 104, 'KRAFT')).toBe(relativeAgingRate(104, 'normal'));
    expect(xfmr('AGERATE', 104, 'non-upgraded')).toBe(relativeAgingRate(104, 'normal'));
    expect(errorOf(xfmr('AGERATE', 104, 'linen')).message).toMatch(/^argument paper: "linen" is not one of "upgraded", "normal" or /);
  });
});

describe('losses, sizing and the efficiency rules', () => {
  it('reads conductor materials by symbol or name and refuses others', () => {
    const cu = loadLossAtTemperature(10000, 25, 85, 9000, 'Cu', 'IEEE');
    const al = loadLossAtTemperature(10000, 25, 85, 9000, 'Al', 'IEEE');
    expect(xfmr('LOSSTEMP', 10000, 25, 85, 9000, 'cu')).toBe(cu);
    expect(xfmr('LOSSTEMP', 10000, 25, 85, 9000, 'Aluminium')).toBe(al);
    expect(xfmr('LOSSTEMP', 10000, 25, 85, 9000, 'aluminum')).toBe(al);
    expect(errorOf(xfmr('LOSSTEMP', 10000, 25, 85, 9000, 'Fe')).message).toMatch(/^argument material: "Fe" is not one of "Cu", "Al"/);
    expect(errorOf(xfmr('LOSSTEMP', 10000, 25, 85, 9000, 'Cu', 'ANSI')).message).toMatch(/^argument standard: "ANSI" is not one of "IEEE", "IEC"$/);
  });
  it('reads the rating series in any case', () => {
    expect(xfmr('SIZE', 640, 0.2, 'iec')).toBe(800);
    expect(xfmr('SIZE', 120, 0, 'us1')).toBe(167);
    expect(errorOf(xfmr('SIZE', 100, 0, 'EU')).message).toMatch(/"US1", "US3", "IEC"/);
  });
  it('reads the kind of unit with blanks around it, and the EU loss as the regulation writes it', () => {
    expect(xfmr('DOEMIN', 500, ' Liquid ', 3, 2016)).toBe(doeMinimumEfficiency(500, 'liquid', 3, 2016, undefined));
    expect(errorOf(xfmr('DOEMIN', 500, 'oil', 3, 2016)).message).toMatch(/"liquid", "submersible", "lvdry", "mvdry"/);
    expect(xfmr('EUMAXLOSS', 750, 'Po')).toBe(euMaximumLoss(750, 'p0'));
    expect(xfmr('EUMAXLOSS', 750, 'P0')).toBe(euMaximumLoss(750, 'p0'));
    expect(errorOf(xfmr('EUMAXLOSS', 400, 'total')).message).toMatch(/"pk", "p0"/);
    expect(errorOf(xfmr('COMPLIES', 500, 400, 3600, 'IEC')).message).toMatch(/^argument rule: "IEC" is not one of "DOE", "EU", "both"$/);
  });
});

describe('declarations', () => {
  it('every choice argument samples one of its options, and its default is one', () => {
    for (const d of catalog) {
      for (const a of d.args) {
        if (a.choices === undefined) continue;
        expect(a.type, `${d.name} ${a.name}`).toBe('text');
        expect(a.choices.options, `${d.name} ${a.name}`).toContain(a.sample);
        if (a.default !== undefined) expect(a.choices.options).toContain(a.default);
      }
    }
  });
});
