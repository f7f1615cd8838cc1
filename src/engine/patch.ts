/**
 * Writes the recalculated package. Every part is copied as it was stored (its compressed bytes
 * unchanged) except:
 *  - a worksheet whose formula cells got new values: only those `<c>` elements, and the cells of
 *    spilled results, are replaced; every other byte of the part is kept;
 *  - for the first spill in a workbook that has no dynamic-array metadata yet: xl/metadata.xml is
 *    added, with its content type ([Content_Types].xml) and its workbook relationship; a metadata
 *    part the workbook already has for other things (rich values, say) gains the dynamic-array
 *    type and blocks, everything in it kept;
 *  - with `values`, xl/calcChain.xml (the order Excel computes formulas in) is left out, with its
 *    content type and relationship, since no formula is left.
 *
 * Cells (ECMA-376 Part 1 §18.3.1.4 `c`): a number result has no `t`; text is `t="str"` (a formula
 * string, so the shared-string table stays as it is), or an inline string with `values`; TRUE and
 * FALSE are `t="b"`; errors `t="e"`. A spilled result is an array formula over its range
 * (`<f t="array" ref="…">`) whose anchor carries `cm`, the index of the cell-metadata block that
 * marks a dynamic array ([MS-XLSX] 2.6.x: metadataType XLDAPR, futureMetadata with
 * `xda:dynamicArrayProperties fDynamic="1"`), and every other cell of the range its value.
 */
import { a1, DYNAMIC_ARRAY_EXT, findDynamicArrayCm, MAIN_NS, SHEET_METADATA_REL, SHEET_METADATA_TYPE, type FormulaCell, type PackageRead, type SheetRead } from './read';
import type { CellResult, JsonValue } from './xlsx';
import { writeZip, type OutEntry, type ZipReader } from './zip';

// The error codes a file can hold (ECMA-376 Part 1 §18.18.80 ST_CellError? values of `t="e"`);
// HyperFormula's own (#CYCLE!, #ERROR!, #LIC!, #SPILL!) are stored as #VALUE!, and --json gives the real one.
const FILE_ERRORS = new Set(['#NULL!', '#DIV/0!', '#VALUE!', '#REF!', '#NAME?', '#NUM!', '#N/A']);

const esc = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
const escAttr = (s: string): string => esc(s).replace(/"/g, '&quot;');

/** Text that XML 1.0 cannot hold (control characters) written as Excel escapes them: _x0001_. */
const xmlText = (s: string): string => esc(s.replace(/_(x[0-9A-Fa-f]{4}_)/g, '_x005F_$1').replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F]/g, (c) => `_x${c.charCodeAt(0).toString(16).padStart(4, '0').toUpperCase()}_`));

function numberText(n: number): string {
  if (Object.is(n, -0)) return '0';
  return String(n);
}

/** The type and content of a cell holding `v`. */
function valueParts(v: JsonValue, p: string, asValue: boolean): { t?: string; inner: string } {
  if (v === null) return { inner: '' };
  if (typeof v === 'number') return { inner: `<${p}v>${numberText(v)}</${p}v>` };
  if (typeof v === 'boolean') return { t: 'b', inner: `<${p}v>${v ? 1 : 0}</${p}v>` };
  if (typeof v === 'string') {
    if (asValue) return { t: 'inlineStr', inner: `<${p}is><${p}t xml:space="preserve">${xmlText(v)}</${p}t></${p}is>` };
    return { t: 'str', inner: `<${p}v>${xmlText(v)}</${p}v>` };
  }
  return { t: 'e', inner: `<${p}v>${FILE_ERRORS.has(v.error) ? v.error : '#VALUE!'}</${p}v>` };
}

const ATTR = /([^\s=/<>]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/g;

/** The attributes of a start tag, in order, values as written (still escaped). */
function attributes(tag: string): [string, string][] {
  const out: [string, string][] = [];
  const body = tag.replace(/^<[^\s/>]+/, '');
  for (const m of body.matchAll(ATTR)) out.push([m[1]!, m[2] ?? m[3] ?? '']);
  return out;
}

/** A start tag with some attributes set (a value) or removed (null); new ones after the others. */
function withAttributes(name: string, old: [string, string][], set: Record<string, string | null>): string {
  const done = new Set<string>();
  const parts: string[] = [];
  for (const [k, v] of old) {
    if (k in set) {
      done.add(k);
      if (set[k] !== null) parts.push(`${k}="${set[k]}"`);
    } else parts.push(`${k}="${v}"`);
  }
  for (const [k, v] of Object.entries(set)) if (!done.has(k) && v !== null) parts.push(`${k}="${v}"`);
  return `<${name}${parts.length ? ' ' : ''}${parts.join(' ')}`;
}

const prefixOf = (tag: string): string => {
  const m = /^<([^\s/>:]+:)?/.exec(tag);
  return m?.[1] ?? '';
};

interface Edit {
  readonly at: number;
  readonly end: number;
  readonly text: string;
  readonly seq: number;
}

/** Where `value` stands among the first `length` numbers of an ascending column (binary search). */
function indexOfAscending(column: Int32Array, length: number, value: number): number | undefined {
  let lo = 0;
  let hi = length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (column[mid] === value) return mid;
    if (column[mid]! < value) lo = mid + 1;
    else hi = mid - 1;
  }
  return undefined;
}

/** Cells by row and column, found in the sheet's index of `<c>` elements. */
class CellIndex {
  private byRow?: Map<number, [number, number]>;
  constructor(private readonly sheet: SheetRead) {}

  private rows(): Map<number, [number, number]> {
    if (!this.byRow) {
      this.byRow = new Map();
      const [r] = this.sheet.cells.cols;
      for (let i = 0; i < this.sheet.cells.length; i++) {
        const e = this.byRow.get(r![i]!);
        if (e) e[1] = i;
        else this.byRow.set(r![i]!, [i, i]);
      }
    }
    return this.byRow;
  }

  /** The index of the cell, or undefined. */
  find(row: number, col: number): number | undefined {
    const span = this.rows().get(row);
    if (!span) return undefined;
    const cols = this.sheet.cells.cols[1]!;
    for (let i = span[0]; i <= span[1]; i++) if (cols[i] === col) return i;
    return undefined;
  }

  /** Where a new cell of `row` at `col` goes: before the first cell to its right, or at the row's end. */
  insertAt(row: number, col: number): number | undefined {
    const span = this.rows().get(row);
    const [, cols, starts] = this.sheet.cells.cols;
    if (span) for (let i = span[0]; i <= span[1]; i++) if (cols![i]! > col) return starts![i]!;
    const tag = this.rowTag(row);
    if (tag === undefined) return undefined;
    const closeStart = this.sheet.rowTags.cols[3]![tag]!;
    return closeStart < 0 ? undefined : closeStart;
  }

  /** The index of the `<row>` element of that number. */
  rowTag(row: number): number | undefined {
    return indexOfAscending(this.sheet.rowTags.cols[0]!, this.sheet.rowTags.length, row);
  }

  /** Where a new `<row>` of that number goes: before the first row below it, or at the end of sheetData. */
  newRowAt(row: number): number {
    const [nums, starts] = this.sheet.rowTags.cols;
    for (let i = 0; i < this.sheet.rowTags.length; i++) if (nums![i]! > row) return starts![i]!;
    return this.sheet.sheetData.closeStart;
  }
}

/** The new XML of a formula cell, from its old `<c>` element and the `<f>` inside it. */
function formulaCellXml(res: CellResult, old: string, fOld: string, options: { values: boolean; cm: number | undefined }): string {
  const f = res.cell;
  const tagEnd = old.indexOf('>') + 1;
  const oldStart = old.slice(0, tagEnd);
  const cp = old.charCodeAt(1) === 99 && (old.charCodeAt(2) === 32 || old.charCodeAt(2) === 62) ? '' : prefixOf(old); // "<c " or "<c>"
  const spill = res.spill && f.kind !== 'shared' ? res.spill : undefined;
  let value = res.value;
  if (value === null) value = 0; // a formula that reads a blank shows 0, as in Excel
  const { t, inner } = valueParts(value, cp, options.values);
  const set: Record<string, string | null> = { t: t ?? null };
  let formula = '';
  let plainTag = !/\st\s*=|\scm\s*=/.test(oldStart); // no type or metadata to change: the start tag stays
  if (options.values) {
    set.cm = null;
  } else if (!spill && f.kind !== 'array' && (f.template.stored === (f.template.source ?? f.stored) || fOld.endsWith('/>'))) {
    formula = fOld;
  } else {
    const stored = f.written;
    const fAttrs = attributes(fOld.slice(0, fOld.indexOf('>') + 1));
    if (spill) {
      const ref = `${a1(f.row, f.col)}:${a1(f.row + spill.length - 1, f.col + (spill[0]?.length ?? 1) - 1)}`;
      formula = `${withAttributes(`${cp}f`, fAttrs, { t: 'array', ref })}>${esc(stored)}</${cp}f>`;
      if (options.cm !== undefined) {
        set.cm = String(options.cm);
        plainTag = false;
      }
    } else if (f.kind === 'array') {
      formula = `${withAttributes(`${cp}f`, fAttrs, { ref: a1(f.row, f.col) })}>${esc(stored)}</${cp}f>`;
    } else {
      formula = `${withAttributes(`${cp}f`, fAttrs, {})}>${esc(stored)}</${cp}f>`;
    }
  }
  let start: string;
  if (plainTag && !options.values) start = t === undefined ? oldStart.slice(0, -1) : `${oldStart.slice(0, -1)} t="${t}"`;
  else start = withAttributes(`${cp}c`, attributes(oldStart), set);
  return `${start}>${formula}${inner}</${cp}c>`;
}

/** Is `at` the start of one of the formula cells (their starts ascending)? */
const isFormulaStart = (starts: Int32Array, at: number): boolean => indexOfAscending(starts, starts.length, at) !== undefined;

/**
 * The edits of a sheet other than its formula cells — cells of spilled results, cleared cells of
 * old array results, rows that must be added — in the order they apply: by position, and at one
 * position insertions before the element that starts there. A formula cell is never overwritten
 * by them: formula cells are written from their own results.
 */
function otherEdits(sheet: SheetRead, cells: readonly CellResult[], formulaStarts: Int32Array, options: { values: boolean }): Edit[] {
  const text = sheet.text;
  const p = sheet.sheetData.start >= 0 ? prefixOf(text.slice(sheet.sheetData.start, sheet.sheetData.start + 40)) : '';
  const planned = new Map<number, Map<number, string>>();
  const index = new CellIndex(sheet);
  const setCell = (row: number, col: number, xml: string) => {
    let m = planned.get(row);
    if (!m) planned.set(row, (m = new Map()));
    m.set(col, xml);
  };
  /** The start tag of an existing cell, for its style. */
  const oldTag = (row: number, col: number): string | undefined => {
    const i = index.find(row, col);
    if (i === undefined) return undefined;
    const start = sheet.cells.cols[2]![i]!;
    return text.slice(start, text.indexOf('>', start) + 1);
  };
  const valueCell = (row: number, col: number, v: JsonValue): string => {
    const old = oldTag(row, col);
    const keep = old ? attributes(old).filter(([k]) => k === 's') : [];
    const { t, inner } = valueParts(v, p, options.values);
    const start = withAttributes(`${p}c`, [['r', a1(row, col)], ...keep], { t: t ?? null });
    return inner === '' ? `${start}/>` : `${start}>${inner}</${p}c>`;
  };

  // Old array results first: a new result may cover part of another formula's old range.
  for (const { cell: f } of cells) {
    if (!f.oldRange) continue;
    for (let r = f.oldRange.top; r <= f.oldRange.bottom; r++) {
      for (let c = f.oldRange.left; c <= f.oldRange.right; c++) {
        if ((r !== f.row || c !== f.col) && index.find(r, c) !== undefined) setCell(r, c, valueCell(r, c, null));
      }
    }
  }
  for (const res of cells) {
    const f = res.cell;
    const spill = res.spill && f.kind !== 'shared' ? res.spill : undefined;
    if (!spill) continue;
    for (let i = 0; i < spill.length; i++) {
      for (let j = 0; j < spill[i]!.length; j++) if (i > 0 || j > 0) setCell(f.row + i, f.col + j, valueCell(f.row + i, f.col + j, spill[i]![j]!));
    }
  }

  const edits: Edit[] = [];
  const newRows: [number, string][] = [];
  let seq = 1;
  for (const row of [...planned.keys()].sort((a, b) => a - b)) {
    const rowCells = [...planned.get(row)!.entries()].sort((a, b) => a[0] - b[0]);
    const tag = index.rowTag(row);
    if (tag === undefined) {
      newRows.push([row, `<${p}row r="${row}">${rowCells.map(([, x]) => x).join('')}</${p}row>`]);
      continue;
    }
    if (sheet.rowTags.cols[3]![tag]! < 0) {
      // <row/>: written again with its cells.
      const start = sheet.rowTags.cols[1]![tag]!;
      const end = sheet.rowTags.cols[4]![tag]!;
      const open = text.slice(start, end).replace(/\s*\/>$/, '>');
      edits.push({ at: start, end, text: `${open}${rowCells.map(([, x]) => x).join('')}</${p}row>`, seq: seq++ });
      continue;
    }
    for (const [col, xml] of rowCells) {
      const i = index.find(row, col);
      if (i !== undefined) {
        const start = sheet.cells.cols[2]![i]!;
        const end = sheet.cells.cols[3]![i]!;
        if (text.slice(start, end) !== xml && !isFormulaStart(formulaStarts, start)) edits.push({ at: start, end, text: xml, seq: seq++ });
      } else {
        const at = index.insertAt(row, col)!;
        edits.push({ at, end: at, text: xml, seq: seq++ });
      }
    }
  }
  for (const [row, xml] of newRows) {
    if (sheet.sheetData.empty) continue;
    const at = index.newRowAt(row);
    edits.push({ at, end: at, text: xml, seq: seq++ });
  }
  if (sheet.sheetData.empty && newRows.length > 0) {
    const sd = sheet.sheetData;
    const open = text.slice(sd.start, sd.end).replace(/\s*\/>$/, '>');
    edits.push({ at: sd.start, end: sd.end, text: `${open}${newRows.map(([, x]) => x).join('')}</${p}sheetData>`, seq: seq++ });
  }
  return edits.sort((a, b) => a.at - b.at || Number(a.end > a.at) - Number(b.end > b.at) || a.seq - b.seq);
}

/**
 * The sheet's new text, piece by piece: the stretches between edits as they were, each formula
 * cell's new element made when its turn comes (a fleet has hundreds of thousands, none kept), and
 * the other edits merged in by position. `state.changed` tells afterwards whether anything differed.
 */
function* patchedText(
  sheet: SheetRead,
  cells: readonly CellResult[],
  other: readonly Edit[],
  options: { values: boolean; cm: number | undefined },
  state: { changed: boolean },
  onCells: (n: number) => void,
): Generator<string> {
  const text = sheet.text;
  let pos = 0;
  let j = 0;
  // Every edit given here changes the text: other edits are planned only where they do, and a
  // formula cell's only where its new element differs.
  const emit = function* (at: number, end: number, xml: string) {
    if (at < pos) return; // inside an element already replaced
    state.changed = true;
    yield text.slice(pos, at);
    yield xml;
    pos = end;
  };
  const STEP = 8192;
  let k = 0;
  for (const res of cells) {
    if (++k === STEP) {
      onCells(k);
      k = 0;
    }
    const f = res.cell;
    // Insertions at the cell's own start go before it; replacements there are never planned.
    while (j < other.length && other[j]!.at <= f.start) {
      const e = other[j++]!;
      yield* emit(e.at, e.end, e.text);
    }
    if (f.start < pos) continue;
    const old = text.slice(f.start, f.end);
    const xml = formulaCellXml(res, old, text.slice(f.fStart, f.fEnd), options);
    if (xml !== old) yield* emit(f.start, f.end, xml);
  }
  while (j < other.length) {
    const e = other[j++]!;
    yield* emit(e.at, e.end, e.text);
  }
  yield text.slice(pos);
  onCells(k);
}

const DYNAMIC_ARRAY_NS = 'http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray';
const XLDAPR_TYPE = (p: string) =>
  `<${p}metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1" cellMeta="1"/>`;
const DYNAMIC_BLOCK = (p: string) => `<${p}bk><${p}extLst><${p}ext uri="${DYNAMIC_ARRAY_EXT}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></${p}ext></${p}extLst></${p}bk>`;

/** A metadata part with nothing in it yet: ours, where the workbook has none, gets its block added like any other. */
const EMPTY_METADATA = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<metadata xmlns="${MAIN_NS}"></metadata>`;

/**
 * An existing metadata part (CT_Metadata: metadataTypes, metadataStrings, mdxMetadata,
 * futureMetadata*, cellMetadata, valueMetadata, extLst, in that order) with a dynamic-array block
 * added: the XLDAPR type if it is missing, a futureMetadata block with fDynamic, and a cellMetadata
 * block pointing at both. Every element already there stays as it was, so the `cm` and `vm`
 * indexes other cells hold still mean what they meant. Undefined where the part is not in a form
 * this can extend (the result is read back to be sure), and the caller writes legacy arrays.
 */
export function withDynamicArrayBlock(text: string, part: string): { text: string; cm: number } | undefined {
  const root = /<(\w+:)?metadata\b([^>]*?)(\/?)>/.exec(text);
  if (root === null || root[3] === '/') return undefined;
  const p = root[1] ?? '';
  const declared = /\sxmlns:xda\s*=\s*["']([^"']*)["']/.exec(root[2]!);
  if (declared !== null && declared[1] !== DYNAMIC_ARRAY_NS) return undefined;
  let out = declared !== null ? text : `${text.slice(0, root.index)}<${p}metadata${root[2]} xmlns:xda="${DYNAMIC_ARRAY_NS}">${text.slice(root.index + root[0].length)}`;
  const tag = (name: string) => `${p}${name}`;

  /** The first `name` element whose start tag passes `test`, with its attributes and content. */
  const element = (name: string, test: (attrs: string) => boolean = () => true) => {
    for (const m of out.matchAll(new RegExp(`<${tag(name)}(\\s[^>]*)?>([\\s\\S]*?)</${tag(name)}>`, 'g'))) {
      if (test(m[1] ?? '')) return { name, at: m.index, whole: m[0], attrs: m[1] ?? '', body: m[2]! };
    }
    return undefined;
  };
  const count = (body: string, name: string) => body.match(new RegExp(`<${tag(name)}[\\s/>]`, 'g'))?.length ?? 0;
  /** The element with `xml` appended to its content and its count attribute, if it has one, set to n. */
  const append = (e: NonNullable<ReturnType<typeof element>>, n: number, xml: string) => {
    const attrs = e.attrs.replace(/(\scount\s*=\s*)(["'])\d*\2/, `$1"${n}"`);
    out = `${out.slice(0, e.at)}<${tag(e.name)}${attrs}>${e.body}${xml}</${tag(e.name)}>${out.slice(e.at + e.whole.length)}`;
  };
  /**
   * Inserts `xml` after the last of these elements the part has (their names occur nowhere else,
   * so their last end is the place), or first in the part when it has none of them.
   */
  const insertAfter = (names: string[], xml: string) => {
    let i = out.indexOf('>', out.search(new RegExp(`<${tag('metadata')}[\\s>]`))) + 1;
    for (const n of names) for (const m of out.matchAll(new RegExp(`</${tag(n)}>|<${tag(n)}(\\s[^>]*)?/>`, 'g'))) i = Math.max(i, m.index + m[0].length);
    out = out.slice(0, i) + xml + out.slice(i);
  };
  // A self-closing (empty) list would need rewriting rather than extending: left to legacy arrays.
  for (const name of ['metadataTypes', 'cellMetadata']) if (new RegExp(`<${tag(name)}\\b[^>]*/>`).test(out)) return undefined;

  let t: number;
  const types = element('metadataTypes');
  if (types === undefined) {
    insertAfter([], `<${tag('metadataTypes')} count="1">${XLDAPR_TYPE(p)}</${tag('metadataTypes')}>`);
    t = 1;
  } else {
    const names = [...types.body.matchAll(new RegExp(`<${tag('metadataType')}\\s[^>]*?\\bname\\s*=\\s*["']([^"']*)["']`, 'g'))].map((m) => m[1]);
    t = names.indexOf('XLDAPR') + 1;
    if (t === 0) {
      t = count(types.body, 'metadataType') + 1;
      append(types, t, XLDAPR_TYPE(p));
    }
  }

  let v: number;
  const future = element('futureMetadata', (attrs) => /\bname\s*=\s*["']XLDAPR["']/.test(attrs));
  if (future === undefined) {
    insertAfter(['metadataTypes', 'metadataStrings', 'mdxMetadata', 'futureMetadata'], `<${tag('futureMetadata')} name="XLDAPR" count="1">${DYNAMIC_BLOCK(p)}</${tag('futureMetadata')}>`);
    v = 0;
  } else {
    v = count(future.body, 'bk');
    append(future, v + 1, DYNAMIC_BLOCK(p));
  }

  let cm: number;
  const record = `<${tag('bk')}><${tag('rc')} t="${t}" v="${v}"/></${tag('bk')}>`;
  const cells = element('cellMetadata');
  if (cells === undefined) {
    insertAfter(['metadataTypes', 'metadataStrings', 'mdxMetadata', 'futureMetadata'], `<${tag('cellMetadata')} count="1">${record}</${tag('cellMetadata')}>`);
    cm = 1;
  } else {
    cm = count(cells.body, 'bk') + 1;
    append(cells, cm, record);
  }
  try {
    return findDynamicArrayCm(out, part) === cm ? { text: out, cm } : undefined;
  } catch {
    return undefined; // the edit left the part unreadable: legacy arrays, the part as it was
  }
}

function freeName(taken: Set<string>, base: string, ext: string): string {
  if (!taken.has(`${base}${ext}`)) return `${base}${ext}`;
  for (let i = 1; ; i++) if (!taken.has(`${base}${i}${ext}`)) return `${base}${i}${ext}`;
}

function freeRelId(rels: string): string {
  const used = new Set([...rels.matchAll(/Id\s*=\s*["']([^"']+)["']/g)].map((m) => m[1]));
  for (let i = 1; ; i++) if (!used.has(`rId${i}`)) return `rId${i}`;
}

/** Drops the Override of a part from [Content_Types].xml and its Relationship from a .rels text. */
const withoutOverride = (types: string, part: string): string => types.replace(new RegExp(`<Override[^>]*PartName="/${part.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}"[^>]*/>`, 'g'), '');
const withoutRelTo = (rels: string, type: RegExp): string => rels.replace(/<Relationship\b[^>]*\/>/g, (r) => (type.test(r) ? '' : r));

export interface Patched {
  readonly bytes: Buffer;
  readonly changedParts: string[];
}

export async function patchPackage(
  zip: ZipReader,
  read: PackageRead,
  cells: CellResult[],
  options: { values: boolean; onProgress: (done: number, total: number) => void },
): Promise<Patched> {
  options.onProgress(0, 1);
  const bySheet = new Map<number, CellResult[]>();
  for (const c of cells) {
    const list = bySheet.get(c.cell.sheet);
    if (list) list.push(c);
    else bySheet.set(c.cell.sheet, [c]);
  }
  const needsMetadata = !options.values && cells.some((c) => c.spill && c.cell.kind !== 'shared');
  const taken = new Set(read.entries.map((e) => e.name));
  let cm = read.dynamicArrayCm;
  const added: OutEntry[] = [];
  const replaced = new Map<string, Uint8Array>();
  const dropped = new Set<string>();

  if (needsMetadata && cm === undefined && read.metadataPath === undefined) {
    // A metadata part of our own, related from the workbook and typed in [Content_Types].xml.
    const folder = read.workbookPath.slice(0, read.workbookPath.lastIndexOf('/') + 1);
    const path = freeName(taken, `${folder}metadata`, '.xml');
    const rels = read.texts.get(read.workbookRelsPath) ?? `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"></Relationships>`;
    const rel = `<Relationship Id="${freeRelId(rels)}" Type="${SHEET_METADATA_REL}" Target="${path.slice(folder.length)}"/>`;
    const types = read.texts.get('[Content_Types].xml') ?? '';
    replaced.set(read.workbookRelsPath, Buffer.from(rels.replace(/<\/(\w+:)?Relationships>\s*$/, (end) => `${rel}${end}`), 'utf8'));
    replaced.set('[Content_Types].xml', Buffer.from(types.replace(/<\/(\w+:)?Types>\s*$/, (end) => `<Override PartName="/${path}" ContentType="${SHEET_METADATA_TYPE}"/>${end}`), 'utf8'));
    const own = withDynamicArrayBlock(EMPTY_METADATA, path)!;
    added.push({ name: path, content: Buffer.from(own.text, 'utf8') });
    cm = own.cm;
  }
  if (needsMetadata && cm === undefined && read.metadataPath !== undefined) {
    const text = read.texts.get(read.metadataPath);
    const grown = text === undefined ? undefined : withDynamicArrayBlock(text, read.metadataPath);
    if (grown !== undefined) {
      replaced.set(read.metadataPath, Buffer.from(grown.text, 'utf8'));
      cm = grown.cm;
    }
  }
  if (options.values) {
    const chain = read.entries.find((e) => /(^|\/)calcChain\.xml$/i.test(e.name));
    if (chain) {
      dropped.add(chain.name);
      const types = read.texts.get('[Content_Types].xml');
      if (types !== undefined) replaced.set('[Content_Types].xml', Buffer.from(withoutOverride(types, chain.name), 'utf8'));
      const rels = read.texts.get(read.workbookRelsPath);
      if (rels !== undefined) replaced.set(read.workbookRelsPath, Buffer.from(withoutRelTo(rels, /\/calcChain"/), 'utf8'));
    }
  }

  const total = Math.max(1, cells.length);
  let done = 0;
  const onCells = (n: number) => options.onProgress((done += n), total);
  const patched = new Map<string, { pieces: Iterable<string>; state: { changed: boolean } }>();
  for (const [i, sheet] of read.sheets.entries()) {
    const list = bySheet.get(i);
    if (!list || list.length === 0) continue;
    // Formula cells in the order they stand in the part (as read, unless a caller mixed them).
    const ordered = list.every((c, k) => k === 0 || list[k - 1]!.cell.start < c.cell.start) ? list : [...list].sort((a, b) => a.cell.start - b.cell.start);
    const starts = new Int32Array(ordered.length);
    for (let k = 0; k < ordered.length; k++) starts[k] = ordered[k]!.cell.start;
    const other = otherEdits(sheet, ordered, starts, options);
    const state = { changed: false };
    const sheetOptions = { values: options.values, cm };
    const pieces = patchedText(sheet, ordered, other, sheetOptions, state, onCells);
    patched.set(sheet.path, { pieces, state });
  }

  const out: OutEntry[] = [];
  for (const e of read.entries) {
    if (dropped.has(e.name)) continue;
    const content = replaced.get(e.name);
    const sheet = patched.get(e.name);
    if (content) out.push({ name: e.name, content });
    else if (sheet) out.push({ name: e.name, pieces: sheet.pieces, original: { entry: e, raw: () => zip.raw(e), changed: () => sheet.state.changed } });
    else out.push({ name: e.name, copy: e, raw: await zip.raw(e) });
  }
  out.push(...added);
  const bytes = await writeZip(out);
  const changedParts = [
    ...read.entries
      .map((e) => e.name)
      .filter((name) => dropped.has(name) || replaced.has(name) || patched.get(name)?.state.changed === true),
    ...added.map((a) => a.name),
  ];
  options.onProgress(total, total);
  return { bytes, changedParts };
}

export type { FormulaCell };
