/**
 * docs/functions.md, generated from the declarations by `npm run docs`; a test fails when the
 * checked-in file is stale. Each function's worked example is built from its declaration's sample
 * values and computed by the embedded engine (HyperFormula with the catalog, src/engine) while the
 * document is written: the numbers in it are what a workbook shows, never typed by hand.
 */
import type { RawCellContent } from 'hyperformula';
import { catalog, formulaName, NAMESPACE } from '../src/cells/catalog';
import type { ArgDecl, CellFunctionDecl, Scalar } from '../src/cells/declaration';
import {
  cellName,
  columnLetters,
  computeSheets,
  formulaLiteral,
  isError,
  markdownTable,
  rangeName,
  sheetTable,
  showValue,
  type ComputedFormula,
  type DocSheet,
  type ShownValue,
} from './doc-sheets';

export const FUNCTIONS_DOC = 'docs/functions.md';

/** The text a user might paste from a report where a number belongs. */
const TEXT_FOR_NUMBER = 'n/a';
/** A word no text option takes, for a function without a number argument. */
const UNKNOWN_WORD = 'none';


/** GitHub's heading anchors: lower case, punctuation dropped, spaces to hyphens. */
export const anchor = (heading: string): string =>
  heading
    .toLowerCase()
    .replace(/[^\p{L}\p{N} _-]/gu, '')
    .replace(/ /g, '-');

/**
 * How many arguments the example passes: every required one, and optional ones up to the last
 * whose sample says something the default does not (a trailing sample equal to its default is left
 * out, as a user would leave it out).
 */
function argumentsShown(d: CellFunctionDecl): number {
  let n = 0;
  d.args.forEach((a, k) => {
    const sameAsDefault = a.default !== undefined && (Array.isArray(a.sample) ? a.sample.length === 1 && a.sample[0] === a.default : a.sample === a.default);
    if (!a.optional || !sameAsDefault) n = k + 1;
  });
  return n;
}

/** A change to one argument of the example, for the error example. */
interface Spoil {
  readonly k: number;
  /** For a single-value argument the new literal; for a series its first value. */
  readonly value: Scalar;
}

interface Layout {
  readonly sheet: DocSheet;
  /** Which cells hold which series: "A1:A8 holds `loads`". */
  readonly holds: readonly { readonly range: string; readonly arg: ArgDecl }[];
  readonly labels: readonly string[];
}

/** The example as a tiny sheet: each series down its own column from A1, the formula to their right. */
function layout(d: CellFunctionDecl, spoil?: Spoil): Layout {
  const count = Math.max(argumentsShown(d), spoil ? spoil.k + 1 : 0);
  const cells: RawCellContent[][] = [];
  const holds: { range: string; arg: ArgDecl }[] = [];
  const labels: string[] = [];
  const parts: string[] = [];
  let col = 0;
  for (let k = 0; k < count; k++) {
    const a = d.args[k]!;
    const value = spoil?.k === k ? spoil.value : undefined;
    if (a.series) {
      const values: Scalar[] = [...(a.sample as readonly number[])];
      if (value !== undefined) values[0] = value;
      values.forEach((v, i) => {
        while (cells.length <= i) cells.push([]);
        cells[i]![col] = v;
      });
      const range = rangeName(0, col, values.length, 1);
      holds.push({ range, arg: a });
      labels[col] = a.name;
      parts.push(range);
      col++;
    } else {
      parts.push(formulaLiteral(value ?? (a.sample as Scalar)));
    }
  }
  const formula = `=${formulaName(d)}(${parts.join(', ')})`;
  return { sheet: { cells, formulas: [{ at: { row: 0, col }, formula }] }, holds, labels };
}

/** The error example: the first number argument negative, or text where negative is allowed. */
function errorCandidates(d: CellFunctionDecl): Spoil[] {
  const k = d.args.findIndex((a) => a.type === 'number');
  if (k < 0) {
    const t = d.args.findIndex((a) => a.type === 'text');
    return t < 0 ? [] : [{ k: t, value: UNKNOWN_WORD }];
  }
  const a = d.args[k]!;
  const first = Array.isArray(a.sample) ? (a.sample[0] as number) : (a.sample as number);
  return [
    { k, value: first === 0 ? -1 : -Math.abs(first) },
    { k, value: TEXT_FOR_NUMBER },
  ];
}

interface FunctionExample {
  readonly decl: CellFunctionDecl;
  readonly example: Layout;
  readonly computed: ComputedFormula;
  readonly spoil: Spoil;
  readonly error: Layout;
  readonly computedError: ComputedFormula;
}

const INTRO_SHEETS = {
  column: {
    cells: [[500], [TEXT_FOR_NUMBER], [1500]],
    formulas: [{ at: { row: 0, col: 1 }, formula: `=${NAMESPACE}.IRATED(A1:A3, 480)` }],
  },
  table: {
    cells: [[null, 0.8, 0.9, 1], [0.25], [0.5], [1]],
    formulas: [{ at: { row: 1, col: 1 }, formula: `=${NAMESPACE}.EFF(1000, 1400, 10500, A2:A4, B1:D1)` }],
  },
  mismatch: {
    cells: [[500, 1400], [1000, 1400], [1500]],
    formulas: [{ at: { row: 0, col: 2 }, formula: `=${NAMESPACE}.EFFMAX(A1:A3, B1:B2, 10500)` }],
  },
} satisfies Record<string, DocSheet>;

export interface FunctionsDocModel {
  readonly functions: readonly FunctionExample[];
  readonly intro: Record<keyof typeof INTRO_SHEETS, ComputedFormula>;
}

/** Lays out every example and computes them all in one engine. */
export function functionsDocModel(decls: readonly CellFunctionDecl[] = catalog): FunctionsDocModel {
  const plans = decls.map((decl) => ({ decl, example: layout(decl), errors: errorCandidates(decl).map((s) => ({ spoil: s, layout: layout(decl, s) })) }));
  const introKeys = Object.keys(INTRO_SHEETS) as (keyof typeof INTRO_SHEETS)[];
  const sheets: DocSheet[] = [...introKeys.map((k) => INTRO_SHEETS[k])];
  for (const p of plans) sheets.push(p.example.sheet, ...p.errors.map((e) => e.layout.sheet));
  const computed = computeSheets(sheets).map((s) => s.results[0]!);
  let next = 0;
  const take = (): ComputedFormula => computed[next++]!;
  const intro = Object.fromEntries(introKeys.map((k) => [k, take()])) as FunctionsDocModel['intro'];
  const functions = plans.map((p): FunctionExample => {
    const computedExample = take();
    const tried = p.errors.map((e) => ({ ...e, computed: take() }));
    const flagged = computedExample.result.flat().find(isError);
    if (flagged) throw new Error(`${formulaName(p.decl)}: the example on the declared samples gives ${flagged.error} ${flagged.message}`);
    const chosen = tried.find((t) => t.computed.result.length === 1 && t.computed.result[0]!.length === 1 && isValueError(t.computed.result[0]![0]!));
    if (!chosen) throw new Error(`${formulaName(p.decl)}: no error example gives #VALUE!`);
    return { decl: p.decl, example: p.example, computed: computedExample, spoil: chosen.spoil, error: chosen.layout, computedError: chosen.computed };
  });
  return { functions, intro };
}

const isValueError = (v: ShownValue): boolean => isError(v) && v.error === '#VALUE!';

// ---------------------------------------------------------------------------------------------
// Rendering

function signature(d: CellFunctionDecl): string {
  return `${formulaName(d)}(${d.args.map((a) => (a.optional ? `[${a.name}]` : a.name)).join(', ')})`;
}

function unitOf(a: ArgDecl): string {
  if (a.unit) return a.unit;
  return a.type === 'boolean' ? 'TRUE/FALSE' : a.type;
}

function argumentTable(d: CellFunctionDecl): string {
  const body = d.args.map((a) => [
    `\`${a.name}\`${a.series ? ' (range)' : ''}`,
    unitOf(a),
    a.optional ? 'yes' : 'no',
    a.default === undefined ? (a.optional ? 'blank' : '') : `\`${formulaLiteral(a.default)}\``,
    a.help,
  ]);
  return markdownTable(['argument', 'unit', 'optional', 'default', 'help'], body);
}

function resultLine(d: CellFunctionDecl): string {
  if (d.kind === 'block') {
    const columns = d.result.columns ?? [d.result.unit];
    return `**Result:** a block that spills from the formula's cell; ${columns.length === 1 ? 'one column' : `${columns.length} columns`}: ${columns.join(' · ')}.`;
  }
  return `**Result:** ${d.result.unit}.`;
}

function valueText(v: ShownValue, unit?: string): string {
  if (isError(v)) return `\`${v.error}\` — ${v.message}`;
  return typeof v === 'number' && unit ? `**${showValue(v)}** (${unit})` : `**${showValue(v)}**`;
}

/** The formula's result: one value, or the spilled block as a small table with its cells' names. */
function resultText(s: ComputedFormula, columns?: readonly string[], unit?: string): string {
  const rows = s.result.length;
  const cols = s.result[0]?.length ?? 1;
  if (rows === 1 && cols === 1) return `→ ${valueText(s.result[0]![0]!, unit)}`;
  const spill = rangeName(s.at.row, s.at.col, rows, cols);
  const header = [''];
  for (let c = 0; c < cols; c++) header.push(`${columnLetters(s.at.col + c)}${columns?.[c] ? `: ${columns[c]}` : ''}`);
  const body = s.result.map((r, i) => [String(s.at.row + i + 1), ...r.map(showValue)]);
  return `spills ${rows} rows × ${cols} ${cols === 1 ? 'column' : 'columns'} into ${spill}:\n\n${markdownTable(header, body, header.map(() => true))}`;
}

function holdsText(l: Layout): string {
  return l.holds.map((h) => `${h.range} holds \`${h.arg.name}\``).join(', ');
}

function exampleSection(f: FunctionExample): string {
  const out: string[] = [];
  const at = cellName(f.computed.at.row, f.computed.at.col);
  if (f.example.holds.length > 0) {
    out.push(`**Example.** The sheet (${holdsText(f.example)}):`, '', sheetTable(f.example.sheet.cells, f.example.labels), '');
    out.push(`In ${at}: \`${f.computed.formula}\` ${resultText(f.computed, f.decl.result.columns, f.decl.result.unit)}`);
  } else {
    out.push(`**Example.** In ${at}: \`${f.computed.formula}\` ${resultText(f.computed, f.decl.result.columns, f.decl.result.unit)}`);
  }
  out.push('', errorText(f));
  return out.join('\n');
}

function errorText(f: FunctionExample): string {
  const a = f.decl.args[f.spoil.k]!;
  const v = f.computedError.result[0]![0]!;
  if (a.series) {
    const cell = f.error.holds.find((h) => h.arg === a)!.range.split(':')[0]!;
    const typed = typeof f.spoil.value === 'number' ? showValue(f.spoil.value) : `the text ${f.spoil.value}`;
    const why = typeof f.spoil.value === 'number' ? 'negative' : 'text';
    return `**Error example.** With ${typed} in ${cell} (the first value of \`${a.name}\` made ${why}), the same formula gives ${valueText(v)}`;
  }
  const what =
    typeof f.spoil.value === 'number' ? `A negative \`${a.name}\`` : a.type === 'number' ? `Text in \`${a.name}\`` : `An unknown \`${a.name}\``;
  return `**Error example.** ${what}: \`${f.computedError.formula}\` → ${valueText(v)}`;
}

function functionSection(f: FunctionExample): string {
  const d = f.decl;
  return [
    `### ${formulaName(d)}`,
    '',
    d.help,
    '',
    `\`${signature(d)}\``,
    '',
    argumentTable(d),
    '',
    resultLine(d),
    '',
    `**Source:** ${d.source}.`.replace(/\.\.$/, '.'),
    '',
    exampleSection(f),
  ].join('\n');
}

function groupsOf(functions: readonly FunctionExample[]): { group: string; functions: FunctionExample[] }[] {
  const groups: { group: string; functions: FunctionExample[] }[] = [];
  for (const f of functions) {
    const last = groups[groups.length - 1];
    if (last && last.group === f.decl.group) last.functions.push(f);
    else groups.push({ group: f.decl.group, functions: [f] });
  }
  return groups;
}

function intro(m: FunctionsDocModel): string {
  const { column, table, mismatch } = m.intro;
  return `# Fluxbook cell functions

<!-- Generated from the declarations in src/cells/functions by \`npm run docs\`; do not edit. -->

Every function of the \`${NAMESPACE}\` namespace: what it computes, its arguments, its result, the
standard or textbook it follows, a worked example and an example of a refusal. The examples are
built from each declaration's sample values and computed by Fluxbook's embedded spreadsheet engine
(HyperFormula with the same functions the add-in registers) when this page is generated; numbers
are rounded to 6 significant figures for reading, where the sheet keeps 15.

> **Safety.** Results are planning estimates. They can feed decisions about energised equipment:
> have them verified by a qualified engineer; local electrical codes and the manufacturer's data
> govern over anything computed here.

## Units

One unit per quantity, everywhere: rating kVA; voltage V, line-to-line for three-phase; current A;
loss W; energy kWh; temperature °C; time h; load per unit of nameplate kVA (1 = full load);
power factor 0 to 1; money in your own currency. Percentages are Excel percentages: type an
impedance as \`5.75%\` or \`0.0575\` — the tables below give their unit as *fraction*. Text options
(\`"Cu"\`, \`"ONAN"\`, \`"Dyn11"\`) are read in any case.

## Ranges: broadcast and spill

Every argument that is not marked *(range)* takes a single cell, a literal, a column, a row or a
block, and the arguments broadcast like Excel array arithmetic: a single value pairs with every
element, a column of n with a block of n rows, a row of m with a block of m columns. The formula
is typed once and its results spill in the broadcast shape. A bad value spoils only its own
result. With 500, the text "${TEXT_FOR_NUMBER}" and 1500 in A1:A3 (kVA):

${sheetTable(INTRO_SHEETS.column.cells)}

\`${column.formula}\` in ${cellName(column.at.row, column.at.col)} ${resultText(column)}

(${cellName(column.at.row + 1, column.at.col)} is ${valueText(column.result[1]![0]!)}.)

A column and a row make a table: per-unit loads in A2:A4 and power factors in B1:D1,

${sheetTable(INTRO_SHEETS.table.cells)}

\`${table.formula}\` in ${cellName(table.at.row, table.at.col)} ${resultText(table)}

Shapes that do not fit refuse the whole call with one error: with three ratings in A1:A3 and two
no-load losses in B1:B2, \`${mismatch.formula}\` → ${valueText(mismatch.result[0]![0]!)}

Arguments marked *(range)* — a loading profile, a list of harmonic orders — are series: taken whole,
read row by row, blank cells after the last value ignored. Functions whose result is a block (a
curve, a profile, a share per unit) take single values elsewhere and spill the block.

## Errors

\`#VALUE!\` for bad input — a blank required cell, text where a number belongs, a number out of its
domain — with a message naming the argument and the reason (Excel shows it on the cell's error
flag); \`#NUM!\` where valid inputs have no numeric answer; \`#N/A\` where a standard's table has no
row for the input. Each function's error example below shows the message the engine carries.`;
}

export function functionsDoc(m: FunctionsDocModel = functionsDocModel()): string {
  const groups = groupsOf(m.functions);
  const contents = groups.map(
    (g) => `- [${g.group}](#${anchor(g.group)}): ${g.functions.map((f) => `[${f.decl.name}](#${anchor(formulaName(f.decl))})`).join(' · ')}`,
  );
  const body = groups.map((g) => [`## ${g.group}`, '', ...g.functions.map((f) => `${functionSection(f)}\n`)].join('\n'));
  return `${intro(m)}\n\n## Contents\n\n${contents.join('\n')}\n\n${body.join('\n').trimEnd()}\n`;
}
