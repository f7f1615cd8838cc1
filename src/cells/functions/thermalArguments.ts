/**
 * The arguments every loading-and-aging function shares, with one help text each, and the one
 * place a unit's thermal model is built from them: the cooling mode (or a heat-run block spilled by
 * XFMR.HEATRUN), the method, and whatever of the unit's own data the formula gives.
 * Not a group file: the catalog lists declarations only.
 */
import { InputError } from '../../core/errors';
import { oneOf } from '../../core/guards';
import {
  LOADING_CATEGORIES,
  parseCooling,
  parsePaper,
  parseThermalMethod,
  thermalModel,
  UNIT_SIZES,
  type LoadingCategory,
  type Paper,
  type ThermalCharacteristics,
  type ThermalData,
  type UnitSize,
} from '../../core/thermal';
import { num, series, text } from '../declaration';

export const GROUP = 'Loading and aging';
export const SOURCE = 'IEEE C57.91 clause 7; IEC 60076-7 clause 8 and Table 4 (from memory)';
/** The caution of every function that speaks of loading beyond nameplate. */
export const BEYOND_NAMEPLATE =
  'Loading beyond nameplate: a planning estimate only; the manufacturer’s data, the owner’s practice and local codes govern, and a qualified engineer verifies it.';

export const cooling = text(
  'cooling',
  'Cooling mode — "ONAN", "ONAF", "OFAF" (or "OF"), "ODAF" (or "OD") — which picks the table row of exponents, time constants and rated rises; or the block XFMR.HEATRUN spills, holding the unit\'s own heat-run data (then the method comes from the block).',
  'ONAN',
  { default: 'ONAN' },
);
export const method = text(
  'method',
  '"IEEE" (C57.91 clause 7, the default), "IEC" (60076-7; ONAN takes the distribution-transformer row, the other coolings the power-transformer rows) or "IEC-POWER" (60076-7 power-transformer rows for every cooling, ONAN included). Blank with a heat-run block: the block\'s method.',
  'IEEE',
  { optional: true },
);
export const topOilRise = num('top_oil_rise', 'K', "Top-oil rise over ambient at rated load (heat-run report); blank takes the block's or the table's value.", 55, { optional: true });
export const hsGradient = num('hs_gradient', 'K', "Hot-spot rise over top oil at rated load (IEEE Δθ_H,R; IEC H·gr); blank takes the block's or the table's value.", 25, { optional: true });
export const lossRatio = num('loss_ratio', 'ratio', "Load loss at rated current ÷ no-load loss (Pk/P0 from the test report); blank takes the block's or the table's value (5 or 6).", 5, { optional: true });
export const tauOil = num('tau_oil_min', 'min', "Rated oil time constant; blank takes the block's or the table's value.", 180, { optional: true });
export const tauWinding = num('tau_winding_min', 'min', "Winding time constant; blank takes the block's or the table's value.", 4, { optional: true });
export const paper = text(
  'paper',
  '"upgraded" (thermally upgraded paper, rate 1 at 110 °C) or "normal" (kraft paper, rate 1 at 98 °C); blank follows the method — upgraded for IEEE, normal for the IEC rows, whose rated point is 98 °C — or the heat-run block.',
  'upgraded',
  { optional: true },
);
export const loads = series('loads', 'per unit', 'Loading profile: one per-unit load (kVA / nameplate kVA) per step, e.g. 8,760 hourly values.', [0.6, 0.7, 0.9, 1.2, 1.3, 1.1, 0.8, 0.6]);
export const ambients = series('ambients', '°C', 'Ambient temperature: one cell for the whole profile or one value per step, -60 to 60 °C.', [25]);
export const hours = num('hours', 'h', 'Length of every step of the profile.', 1, { default: 1 });
export const ambient = num('ambient_c', '°C', 'Ambient temperature, -60 to 60 °C.', 30);
export const category = text(
  'category',
  'Loading category: "normal" (IEEE normal life expectancy, IEC normal cyclic), "planned" (IEEE planned loading beyond nameplate), "long-time emergency" or "short-time emergency" (also "long", "short").',
  'normal',
  { default: 'normal' },
);
export const size = text('size', 'Transformer size for IEC 60076-7\'s limits: "distribution" (default), "medium power" or "large power" ("medium", "large"); IEEE C57.91 gives one set for all.', 'distribution', {
  default: 'distribution',
});

/** The arguments of the profile functions after the series and step length. */
export const thermalArgs = [cooling, topOilRise, hsGradient, lossRatio, method];
export const profileArgs = [loads, ambients, hours, ...thermalArgs];
export const checkArgs = [loads, ambients, hours, category, size, ...thermalArgs];

/** What the cooling argument holds: a mode name, or a heat-run block already read. */
export interface HeatRun {
  readonly kind: 'heat-run';
  readonly method: 'IEEE' | 'IEC' | 'IEC-POWER';
  readonly cooling: 'ONAN' | 'ONAF' | 'OF' | 'OD';
  readonly data: ThermalData;
}
export type CoolingArg = string | HeatRun;

/**
 * The unit's thermal model from the cooling (name or heat-run block), the method and the unit's
 * own values; values given in the formula replace the block's. A method that contradicts the
 * block's is refused rather than silently preferred.
 */
export function modelOf(coolingArg: CoolingArg, methodText: string | undefined, data: ThermalData = {}): ThermalCharacteristics {
  const defined = Object.fromEntries(Object.entries(data).filter(([, v]) => v !== undefined)) as ThermalData;
  if (typeof coolingArg === 'string') {
    return thermalModel(parseThermalMethod(methodText ?? 'IEEE'), parseCooling(coolingArg), defined);
  }
  if (methodText !== undefined && parseThermalMethod(methodText) !== coolingArg.method) {
    throw new InputError('method', `"${methodText}" contradicts the heat-run block in cooling, which is for method "${coolingArg.method}"; leave method blank`);
  }
  return thermalModel(coolingArg.method, coolingArg.cooling, { ...coolingArg.data, ...defined });
}

export function paperOf(m: ThermalCharacteristics, paperText: string | undefined): Paper {
  return paperText === undefined ? m.paper : parsePaper(paperText);
}

const CATEGORY_ALIASES: Readonly<Record<string, LoadingCategory>> = {
  'normal life expectancy': 'normal',
  'normal cyclic': 'normal',
  'planned beyond nameplate': 'planned',
  'planned loading beyond nameplate': 'planned',
  long: 'long-time emergency',
  'long-time': 'long-time emergency',
  'long time emergency': 'long-time emergency',
  short: 'short-time emergency',
  'short-time': 'short-time emergency',
  'short time emergency': 'short-time emergency',
};

export function parseCategory(textValue: string): LoadingCategory {
  const t = String(textValue).trim().toLowerCase().replace(/\s+/g, ' ');
  return CATEGORY_ALIASES[t] ?? oneOf('category', textValue, LOADING_CATEGORIES);
}

const SIZE_ALIASES: Readonly<Record<string, UnitSize>> = { medium: 'medium power', large: 'large power' };

export function parseSize(textValue: string): UnitSize {
  const t = String(textValue).trim().toLowerCase().replace(/\s+/g, ' ');
  return SIZE_ALIASES[t] ?? oneOf('size', textValue, UNIT_SIZES);
}

/** The rows of a heat-run block, in order: label, and how the value is read back. */
export const HEAT_RUN_ROWS = [
  ['method', 'text'],
  ['cooling', 'text'],
  ['top-oil rise (K)', 'topOilRise'],
  ['hot-spot gradient (K)', 'hotSpotGradient'],
  ['loss ratio R', 'lossRatio'],
  ['oil time constant (min)', 'oilTimeConstant'],
  ['winding time constant (min)', 'windingTimeConstant'],
  ['oil exponent n (IEC x)', 'oilExponent'],
  ['winding exponent m (IEC y/2)', 'windingExponentM'],
  ['k11', 'k11'],
  ['k21', 'k21'],
  ['k22', 'k22'],
  ['paper', 'text'],
  ['normal life (h)', 'normalLifeHours'],
] as const;

/** The block XFMR.HEATRUN spills for a model: the label and the value of every row. */
export function heatRunBlock(methodName: 'IEEE' | 'IEC' | 'IEC-POWER', m: ThermalCharacteristics): (string | number)[][] {
  const values: (string | number)[] = [
    methodName,
    m.cooling,
    m.topOilRise,
    m.hotSpotGradient,
    m.lossRatio,
    m.oilTimeConstant,
    m.windingTimeConstant,
    m.oilExponent,
    m.windingExponent / 2,
    m.k11,
    m.k21,
    m.k22,
    m.paper,
    m.normalLifeHours,
  ];
  return HEAT_RUN_ROWS.map(([label], i) => [label, values[i]!]);
}

/**
 * Reads a heat-run block given in place of the cooling name: the rows of HEAT_RUN_ROWS, labels in
 * the first column (as spilled; case and blanks around them do not matter), values in the second.
 * Refusals name the cooling argument and the row.
 */
export function readHeatRun(cells: readonly (readonly unknown[])[]): HeatRun {
  const where = (i: number) => `row ${i + 1} ("${HEAT_RUN_ROWS[i]![0]}")`;
  if (cells.length !== HEAT_RUN_ROWS.length || cells.some((r) => r.length !== 2)) {
    const shape = `${cells.length}×${cells[0]?.length ?? 0}`;
    throw new InputError('cooling', `a ${shape} range is not a heat-run block; give a cooling mode such as "ONAN" or the ${HEAT_RUN_ROWS.length}×2 block XFMR.HEATRUN spills`);
  }
  const data: Record<string, number> = {};
  let methodText = '';
  let coolingText = '';
  let paperText = '';
  HEAT_RUN_ROWS.forEach(([label, key], i) => {
    const [l, v] = cells[i]!;
    if (typeof l !== 'string' || l.trim().toLowerCase() !== label.toLowerCase()) {
      throw new InputError('cooling', `${where(i)} is labelled ${typeof l === 'string' ? `"${l}"` : 'with no text'}; the heat-run block's rows are those XFMR.HEATRUN spills`);
    }
    if (key === 'text') {
      if (typeof v !== 'string') throw new InputError('cooling', `${where(i)} holds no text`);
      if (i === 0) methodText = v;
      else if (i === 1) coolingText = v;
      else paperText = v;
      return;
    }
    if (typeof v !== 'number' || !Number.isFinite(v)) throw new InputError('cooling', `${where(i)} holds no number`);
    data[key] = v;
  });
  const inBlock = <T>(read: () => T): T => {
    try {
      return read();
    } catch (error) {
      if (error instanceof InputError) throw new InputError('cooling', `heat-run block: ${error.argument}: ${error.reason}`);
      throw error;
    }
  };
  const blockMethod = inBlock(() => parseThermalMethod(methodText));
  const blockCooling = inBlock(() => parseCooling(coolingText));
  const blockPaper = inBlock(() => parsePaper(paperText));
  const full: ThermalData = { ...data, paper: blockPaper };
  // The values are checked now, under the block's name, so a bad row is reported as the block's.
  inBlock(() => thermalModel(blockMethod, blockCooling, full));
  return { kind: 'heat-run', method: blockMethod, cooling: blockCooling, data: full };
}
