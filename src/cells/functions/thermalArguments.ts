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
  thermalModel,
  UNIT_SIZES,
  type Cooling,
  type LoadingCategory,
  type Paper,
  type ThermalCharacteristics,
  type ThermalData,
  type ThermalMethod,
  type UnitSize,
} from '../../core/thermal';
import { ambient as sharedAmbient, cooling as sharedCooling, loads as sharedLoads, paper as sharedPaper, thermalMethod, withSample } from '../arguments';
import { type Arg, choice, num, orRange, series } from '../declaration';

export const GROUP = 'Loading and aging';
export const SOURCE = 'IEEE C57.91 clause 7; IEC 60076-7 clause 8 and Table 4 (from memory)';
/** The caution of every function that speaks of loading beyond nameplate. */
export const BEYOND_NAMEPLATE =
  'Loading beyond nameplate: a planning estimate only; the manufacturer’s data, the owner’s practice and local codes govern, and a qualified engineer verifies it.';

/** What the cooling argument holds: a mode name, or a heat-run block already read. */
export interface HeatRun {
  readonly kind: 'heat-run';
  readonly method: ThermalMethod;
  readonly cooling: Cooling;
  readonly data: ThermalData;
}
export type CoolingArg = Cooling | HeatRun;

/** A choice left blank-able without a default: blank reaches compute as undefined. */
function blankable<T extends string>(arg: Arg<T>, help: string): Arg<T | undefined> {
  return { ...arg, help, optional: true, default: undefined };
}

/** The cooling mode, or the block XFMR.HEATRUN spills in its place (read by readHeatRun). */
export const cooling = orRange(sharedCooling, { rows: 14, cols: 2 }, (cells) => readHeatRun(cells));
export const method = blankable(
  thermalMethod,
  '"IEEE" (C57.91 clause 7, the default), "IEC" (60076-7; ONAN takes the distribution-transformer row, the other coolings the power-transformer rows) or "IEC-POWER" (60076-7 power-transformer rows for every cooling, ONAN included). Blank with a heat-run block: the block\'s method.',
);
export const topOilRise = num('top_oil_rise', 'K', "Top-oil rise over ambient at rated load (heat-run report); blank takes the block's or the table's value.", 55, { optional: true });
export const hsGradient = num('hs_gradient', 'K', "Hot-spot rise over top oil at rated load (IEEE Δθ_H,R; IEC H·gr); blank takes the block's or the table's value.", 25, { optional: true });
export const lossRatio = num('loss_ratio', 'ratio', "Load loss at rated current ÷ no-load loss (Pk/P0 from the test report); blank takes the block's or the table's value (5 or 6).", 5, { optional: true });
export const tauOil = num('tau_oil_min', 'min', "Rated oil time constant; blank takes the block's or the table's value.", 180, { optional: true });
export const tauWinding = num('tau_winding_min', 'min', "Winding time constant; blank takes the block's or the table's value.", 4, { optional: true });
export const paper = blankable(
  sharedPaper,
  '"upgraded" (thermally upgraded paper, rate 1 at 110 °C) or "normal" (kraft paper, rate 1 at 98 °C); blank follows the method — upgraded for IEEE, normal for the IEC rows, whose rated point is 98 °C — or the heat-run block.',
);
export const loads = withSample(sharedLoads, [0.6, 0.7, 0.9, 1.2, 1.3, 1.1, 0.8, 0.6]);
export const ambients = series('ambients', '°C', 'Ambient temperature: one cell for the whole profile or one value per step, -60 to 60 °C.', [25]);
export const hours = num('hours', 'h', 'Length of every step of the profile.', 1, { default: 1 });
export const ambient = sharedAmbient;
export const category = choice(
  'category',
  'Loading category: "normal" (IEEE normal life expectancy, IEC normal cyclic), "planned" (IEEE planned loading beyond nameplate), "long-time emergency" or "short-time emergency" (also "long", "short").',
  {
    options: LOADING_CATEGORIES as readonly LoadingCategory[],
    aliases: {
      'normal life expectancy': 'normal',
      'normal cyclic': 'normal',
      'planned beyond nameplate': 'planned',
      'planned loading beyond nameplate': 'planned',
      long: 'long-time emergency',
      'long-time': 'long-time emergency',
      short: 'short-time emergency',
      'short-time': 'short-time emergency',
    },
    default: 'normal',
  },
);
export const size = choice(
  'size',
  'Transformer size for IEC 60076-7\'s limits: "distribution" (default), "medium power" or "large power" ("medium", "large"); IEEE C57.91 gives one set for all.',
  { options: UNIT_SIZES as readonly UnitSize[], aliases: { medium: 'medium power', large: 'large power' }, default: 'distribution' },
);

/** The arguments of the profile functions after the series and step length. */
export const thermalArgs = [cooling, topOilRise, hsGradient, lossRatio, method] as const;
export const profileArgs = [loads, ambients, hours, ...thermalArgs] as const;
export const checkArgs = [loads, ambients, hours, category, size, ...thermalArgs] as const;

/**
 * The unit's thermal model from the cooling (name or heat-run block), the method and the unit's
 * own values; values given in the formula replace the block's. A method that contradicts the
 * block's is refused rather than silently preferred.
 */
export function modelOf(coolingArg: CoolingArg, methodArg: ThermalMethod | undefined, data: ThermalData = {}): ThermalCharacteristics {
  const defined = Object.fromEntries(Object.entries(data).filter(([, v]) => v !== undefined)) as ThermalData;
  if (typeof coolingArg === 'string') return thermalModel(methodArg ?? 'IEEE', coolingArg, defined);
  if (methodArg !== undefined && methodArg !== coolingArg.method) {
    throw new InputError('method', `"${methodArg}" contradicts the heat-run block in cooling, which is for method "${coolingArg.method}"; leave method blank`);
  }
  return thermalModel(coolingArg.method, coolingArg.cooling, { ...coolingArg.data, ...defined });
}

export function paperOf(m: ThermalCharacteristics, paperArg: Paper | undefined): Paper {
  return paperArg ?? m.paper;
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
export function heatRunBlock(methodName: ThermalMethod, m: ThermalCharacteristics): (string | number)[][] {
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
  const options = <T extends string>(arg: Arg<T>, text: string): T =>
    oneOf(arg.name, text, arg.choices!.options as readonly T[], arg.choices!.aliases as Readonly<Record<string, T>>);
  const blockMethod = inBlock(() => options(thermalMethod, methodText));
  const blockCooling = inBlock(() => options(sharedCooling, coolingText));
  const blockPaper = inBlock(() => options(sharedPaper, paperText));
  const full: ThermalData = { ...data, paper: blockPaper };
  // The values are checked now, under the block's name, so a bad row is reported as the block's.
  inBlock(() => thermalModel(blockMethod, blockCooling, full));
  return { kind: 'heat-run', method: blockMethod, cooling: blockCooling, data: full };
}
