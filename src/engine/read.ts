/**
 * Reads what the engine needs from an .xlsx package: the sheet order and names, defined names,
 * shared strings and the dynamic-array cell metadata (small parts, parsed with saxes, a strict
 * well-formedness checking XML parser), and for every worksheet its values, its formulas (shared
 * formulas expanded, ECMA-376 Part 1 §18.3.1.40 `f`) and where each `<row>` and `<c>` element
 * sits in the part's text (parsed with saxen through located.ts, which takes each tag's position
 * from the text), so the writer can replace single cells and copy everything else as it was.
 *
 * A part's text is its UTF-8 decoded as is (a byte-order mark kept): the positions are indexes
 * into that string, and encoding the untouched stretches again gives their bytes back.
 */
import type { RawCellContent } from 'hyperformula';
import { SaxesParser, type SaxesTag } from 'saxes';
import { decodeText, parseLocated, tagEnd } from './located';
import { callsOurFunctions, toEngineFormula, toStoredFormula } from './names';
import { shiftFormula, simpleCall, type SimpleCall } from './formulas';
import { WorkbookError } from './package';
import type { ZipEntry, ZipReader } from './zip';

export const MAIN_NS = 'http://schemas.openxmlformats.org/spreadsheetml/2006/main';
export const REL_NS = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships';
export const SHEET_METADATA_REL = `${REL_NS}/sheetMetadata`;
export const SHEET_METADATA_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml';

const local = (name: string): string => {
  const colon = name.indexOf(':');
  return colon < 0 ? name : name.slice(colon + 1);
};

/**
 * One formula cell as the file stores it. Its texts come from its template (a filled-down column
 * shares one) and are made when asked for: a fleet has hundreds of thousands of these.
 */
export class FormulaCell {
  constructor(
    readonly sheet: number,
    /** 1-based. */
    readonly row: number,
    readonly col: number,
    /** `t` of the `<f>` element: normal, array or shared. */
    readonly kind: 'normal' | 'array' | 'shared',
    /** The `<c>` element in the part's text: [start, end). */
    readonly start: number,
    readonly end: number,
    /** The `<f>` element inside it. */
    readonly fStart: number,
    readonly fEnd: number,
    readonly template: FormulaTemplate,
    /** The formula as stored, when it has no template. */
    private readonly text: string | undefined,
    /** The old result range of an array formula, when larger than its cell. */
    readonly oldRange: CellRange | undefined,
    /** The `cm` attribute, 1-based index of the cell metadata. */
    readonly cm: number | undefined,
  ) {}

  /** The formula as stored (no "="), shared formulas already moved to this cell. */
  get stored(): string {
    return this.text ?? this.template.source!.replaceAll(ROW_MARK, String(this.row));
  }

  /** The formula in the engine's form, no "=". */
  get engine(): string {
    return this.template.source !== undefined ? this.template.engine.replaceAll(ROW_MARK, String(this.row)) : this.template.engine;
  }

  /** The formula as it is written back: our calls under their `_xldudf_` names. */
  get written(): string {
    return this.template.source !== undefined ? this.template.stored.replaceAll(ROW_MARK, String(this.row)) : this.template.stored;
  }

  get ours(): boolean {
    return this.template.ours;
  }
}

export interface CellRange {
  readonly top: number;
  readonly left: number;
  readonly bottom: number;
  readonly right: number;
}

/** Growable columns of 32-bit integers: where each `<c>` is. */
class IntColumns {
  length = 0;
  cols: Int32Array[];
  constructor(n: number) {
    this.cols = Array.from({ length: n }, () => new Int32Array(1024));
  }
  push(a: number, b: number, c: number, d: number, e = 0): void {
    if (this.length === this.cols[0]!.length) {
      this.cols = this.cols.map((col) => {
        const grown = new Int32Array(col.length * 2);
        grown.set(col);
        return grown;
      });
    }
    const cols = this.cols;
    const i = this.length++;
    cols[0]![i] = a;
    cols[1]![i] = b;
    cols[2]![i] = c;
    cols[3]![i] = d;
    if (cols.length > 4) cols[4]![i] = e;
  }
}

export interface SheetRead {
  readonly name: string;
  readonly path: string;
  readonly entry: ZipEntry;
  /** The part's text. */
  readonly text: string;
  /** Values for the engine, rows from 1 (index 0 is row 1). */
  readonly rows: RawCellContent[][];
  readonly formulas: FormulaCell[];
  /** Every `<c>`: row, column, start, end (in document order: by row, then column). */
  readonly cells: IntColumns;
  /** Every `<row>`: number, start, end of its start tag, start of `</row>` (-1 for `<row/>`), end. */
  readonly rowTags: IntColumns;
  /** `<sheetData>`: end of its start tag and start of `</sheetData>`, or the element itself when empty. */
  readonly sheetData: { readonly start: number; readonly openEnd: number; readonly closeStart: number; readonly end: number; readonly empty: boolean };
}

export interface DefinedName {
  readonly name: string;
  readonly formula: string;
  /** The sheet it belongs to (localSheetId), or undefined for the workbook. */
  readonly sheet?: number;
}

export interface PackageRead {
  readonly entries: readonly ZipEntry[];
  readonly sheets: SheetRead[];
  readonly names: DefinedName[];
  readonly date1904: boolean;
  /** Parts by path that the writer may change: content types, workbook relationships, metadata. */
  readonly workbookPath: string;
  readonly workbookRelsPath: string;
  readonly metadataPath?: string;
  /** The 1-based cm index of a dynamic-array cell metadata block the file already has. */
  readonly dynamicArrayCm?: number;
  readonly texts: Map<string, string>;
}

/** "AB12" → { row: 12, col: 28 }. */
export function parseCellRef(ref: string): { row: number; col: number } | undefined {
  let col = 0;
  let i = 0;
  for (; i < ref.length; i++) {
    const c = ref.charCodeAt(i);
    if (c === 36) continue; // $
    if (c >= 65 && c <= 90) col = col * 26 + (c - 64);
    else if (c >= 97 && c <= 122) col = col * 26 + (c - 96);
    else break;
  }
  if (ref.charCodeAt(i) === 36) i++; // $
  let row = 0;
  const digitsFrom = i;
  for (; i < ref.length; i++) {
    const c = ref.charCodeAt(i);
    if (c < 48 || c > 57) return undefined;
    row = row * 10 + (c - 48);
  }
  if (col === 0 || i === digitsFrom || row < 1) return undefined;
  return { row, col };
}

export function parseRange(ref: string): CellRange | undefined {
  const [a, b] = ref.split(':');
  const p = parseCellRef(a ?? '');
  const q = b === undefined ? p : parseCellRef(b);
  if (!p || !q) return undefined;
  return { top: Math.min(p.row, q.row), left: Math.min(p.col, q.col), bottom: Math.max(p.row, q.row), right: Math.max(p.col, q.col) };
}

export function columnLetters(col: number): string {
  let s = '';
  for (let n = col; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

export const a1 = (row: number, col: number): string => `${columnLetters(col)}${row}`;

/** A part's text (a byte-order mark kept). */
async function partText(zip: ZipReader, entry: ZipEntry, onBytes?: (n: number) => void): Promise<string> {
  const bytes = await zip.unpack(entry);
  onBytes?.(bytes.length);
  return new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes);
}

type Handlers = {
  open?: (name: string, attrs: Record<string, string>, selfClosing: boolean) => void;
  close?: (name: string) => void;
  text?: (text: string) => void;
};

/** Parses XML text with saxes; tag names without their prefix. */
function parseXml(text: string, part: string, h: Handlers, parser = new SaxesParser({ position: false })): void {
  if (h.open) parser.on('opentag', (t: SaxesTag) => h.open!(local(t.name), t.attributes as Record<string, string>, t.isSelfClosing));
  if (h.close) parser.on('closetag', (t: SaxesTag) => h.close!(local(t.name)));
  if (h.text) parser.on('text', h.text);
  try {
    parser.write(text).close();
  } catch (error) {
    throw new WorkbookError(`this .xlsx package cannot be read: part ${part} is not well-formed XML (${(error instanceof Error ? error.message : String(error)).split('\n')[0]})`);
  }
}

/** A relationship target resolved against the folder of the part that holds it. */
function resolveTarget(base: string, target: string): string {
  if (target.startsWith('/')) return target.slice(1);
  const parts = base.split('/').slice(0, -1);
  for (const seg of target.split('/')) {
    if (seg === '..') parts.pop();
    else if (seg !== '.') parts.push(seg);
  }
  return parts.join('/');
}

const relsPathOf = (part: string): string => {
  const i = part.lastIndexOf('/');
  return `${part.slice(0, i + 1)}_rels/${part.slice(i + 1)}.rels`;
};

function readRels(text: string, part: string): { id: string; type: string; target: string; external: boolean }[] {
  const out: { id: string; type: string; target: string; external: boolean }[] = [];
  parseXml(text, part, {
    open: (name, a) => {
      if (name === 'Relationship') out.push({ id: a.Id ?? '', type: a.Type ?? '', target: a.Target ?? '', external: a.TargetMode === 'External' });
    },
  });
  return out;
}

function readSharedStrings(text: string, part: string): string[] {
  const out: string[] = [];
  let inSi = false;
  let inT = false;
  let phonetic = 0;
  let cur = '';
  parseXml(text, part, {
    open: (name) => {
      if (name === 'si') {
        inSi = true;
        cur = '';
      } else if (name === 'rPh') phonetic++;
      else if (name === 't') inT = true;
    },
    close: (name) => {
      if (name === 'si') {
        out.push(cur);
        inSi = false;
      } else if (name === 'rPh') phonetic--;
      else if (name === 't') inT = false;
    },
    text: (t) => {
      if (inSi && inT && phonetic === 0) cur += t;
    },
  });
  return out;
}

export const DYNAMIC_ARRAY_EXT = '{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}';

/**
 * The 1-based cm index of a cell metadata block that marks a dynamic array, if the metadata part
 * has one ([MS-XLSX] 2.3.x dynamicArrayProperties: a `cellMetadata` block whose record `rc t` is
 * the 1-based index of the XLDAPR metadata type and `v` the 0-based futureMetadata block with
 * `fDynamic="1"`).
 */
export function findDynamicArrayCm(text: string, part: string): number | undefined {
  const types: string[] = [];
  const dynamicBlocks: boolean[] = [];
  const cellBlocks: { t: number; v: number }[][] = [];
  let inFuture = false;
  let inCellMeta = false;
  let extUri = '';
  parseXml(text, part, {
    open: (name, a) => {
      if (name === 'metadataType') types.push(a.name ?? '');
      else if (name === 'futureMetadata') inFuture = a.name === 'XLDAPR';
      else if (inFuture && name === 'bk') dynamicBlocks.push(false);
      else if (inFuture && name === 'ext') extUri = (a.uri ?? '').toLowerCase();
      else if (inFuture && name === 'dynamicArrayProperties' && extUri === DYNAMIC_ARRAY_EXT) {
        if (a.fDynamic === '1' || a.fDynamic === 'true') dynamicBlocks[dynamicBlocks.length - 1] = true;
      } else if (name === 'cellMetadata') inCellMeta = true;
      else if (inCellMeta && name === 'bk') cellBlocks.push([]);
      else if (inCellMeta && name === 'rc') cellBlocks[cellBlocks.length - 1]?.push({ t: Number(a.t), v: Number(a.v) });
    },
    close: (name) => {
      if (name === 'futureMetadata') inFuture = false;
      else if (name === 'cellMetadata') inCellMeta = false;
    },
  });
  const xldapr = types.indexOf('XLDAPR') + 1;
  if (xldapr === 0) return undefined;
  const i = cellBlocks.findIndex((bk) => bk.some((rc) => rc.t === xldapr && dynamicBlocks[rc.v] === true));
  return i < 0 ? undefined : i + 1;
}

const EXCEL_EPOCH_1900 = Date.UTC(1899, 11, 30);
const EXCEL_EPOCH_1904 = Date.UTC(1904, 0, 1);

/** A plain cell value as the engine reads it: text is marked so that "123" stays text. */
function cellValue(t: string | undefined, v: string | undefined, inline: string | undefined, strings: string[], date1904: boolean): RawCellContent {
  switch (t) {
    case 's': {
      const s = strings[Number(v)];
      return s === undefined ? null : `'${s}`;
    }
    case 'inlineStr':
      return inline === undefined ? null : `'${inline}`;
    case 'str':
      return v === undefined ? null : `'${v}`;
    case 'b':
      return v === undefined ? null : v.trim() === '1' || v.trim() === 'true';
    case 'e':
      return v === undefined ? null : v.trim();
    case 'd': {
      if (v === undefined) return null;
      const ms = Date.parse(/[zZ]|[+-]\d\d:\d\d$/.test(v) ? v : `${v}Z`);
      return Number.isNaN(ms) ? null : (ms - (date1904 ? EXCEL_EPOCH_1904 : EXCEL_EPOCH_1900)) / 86_400_000;
    }
    default: {
      if (v === undefined || v.trim() === '') return null;
      const n = Number(v);
      return Number.isNaN(n) ? `'${v}` : n;
    }
  }
}

/**
 * A formula with its own row number taken out: `XFMR.EFF(B7,F7,0.5)` in row 7 and
 * `XFMR.EFF(B8,F8,0.5)` in row 8 have one template, so the name translation (names.ts) and the
 * shape check of a simple call (formulas.ts) run once for a whole filled-down column.
 */
export interface FormulaTemplate {
  /** The stored formula with ROW_MARK where the row number was; undefined for a formula of its own. */
  readonly source?: string;
  /** The engine's form and the form written back, with ROW_MARK where `source` has it. */
  readonly engine: string;
  readonly stored: string;
  readonly ours: boolean;
  /** The key of a simple call (formulas.ts), the same for every row of the template. */
  readonly simple?: SimpleCall;
}

export const ROW_MARK = '\u0000';

const templates = new Map<string, FormulaTemplate>();

/**
 * The row number may be taken out only where it is the row of a cell reference — after a column
 * letter or "$", not followed by a name character or "(" — so that taking it out cannot change
 * a function name the translations look for. This depends on the marked text alone, so it is
 * checked once per template.
 */
function markedRowsAreReferences(key: string): boolean {
  for (let i = key.indexOf(ROW_MARK); i >= 0; i = key.indexOf(ROW_MARK, i + 1)) {
    const b = key.charCodeAt(i - 1);
    const a = key.charCodeAt(i + 1);
    const letterOrDollar = (b >= 65 && b <= 90) || (b >= 97 && b <= 122) || b === 36;
    const nameNext = (a >= 48 && a <= 57) || (a >= 65 && a <= 90) || (a >= 97 && a <= 122) || a === 95 || a === 46 || a === 40;
    if (!letterOrDollar || nameNext) return false;
  }
  return true;
}

/** The template of a formula in a given row: shared by every formula of the same shape. */
export function formulaTemplate(stored: string, row: number): FormulaTemplate {
  const digits = String(row);
  const key = stored.includes(digits) ? stored.replaceAll(digits, ROW_MARK) : undefined;
  if (key !== undefined) {
    let t = templates.get(key);
    if (t === undefined && markedRowsAreReferences(key)) {
      const engine = toEngineFormula(key);
      t = { source: key, engine, stored: toStoredFormula(key), ours: callsOurFunctions(key), simple: simpleCall(engine, ROW_MARK) };
      if (templates.size > 100_000) templates.clear();
      templates.set(key, t);
    }
    if (t !== undefined) return t;
  }
  const engine = toEngineFormula(stored);
  return { engine, stored: toStoredFormula(stored), ours: callsOurFunctions(stored), simple: simpleCall(engine, row) };
}

/**
 * Does `stored` read as `source` with the row number `digits` where `source` has ROW_MARK? A
 * filled-down column is checked against the template of the cell above it this way, without
 * making the marked text again for every row.
 */
export function fitsTemplate(stored: string, source: string, digits: string): boolean {
  let k = 0;
  for (let i = 0; i < source.length; i++) {
    const c = source.charCodeAt(i);
    if (c === 0) {
      if (!stored.startsWith(digits, k)) return false;
      k += digits.length;
    } else if (stored.charCodeAt(k++) !== c) return false;
  }
  return k === stored.length;
}

/** Attribute values with their references decoded. */
function decodedAttributes(a: Record<string, string>): Record<string, string> {
  for (const k in a) if (a[k]!.indexOf('&') >= 0) a[k] = decodeText(a[k]!);
  return a;
}

interface SharedMaster {
  readonly row: number;
  readonly col: number;
  readonly stored: string;
}

/** Reads one worksheet part's cells; `onProgress` hears how many characters were parsed. */
export function readSheet(
  text: string,
  meta: { name: string; path: string; entry: ZipEntry; index: number },
  strings: string[],
  date1904: boolean,
  onProgress?: (chars: number) => void,
  /** Keep the values formula cells hold from the last calculation in `rows` too (to read a result file). */
  cachedValues = false,
): SheetRead {
  const rows: RawCellContent[][] = [];
  const formulas: FormulaCell[] = [];
  const cells = new IntColumns(4);
  const rowTags = new IntColumns(5);
  const shared = new Map<string, SharedMaster>();
  const oldRanges: CellRange[] = [];
  let sheetData = { start: -1, openEnd: -1, closeStart: -1, end: -1, empty: true };
  /** By column: the template of the last formula read there. */
  const lastTemplate: (FormulaTemplate | undefined)[] = [];
  let digits = '';
  let digitsRow = -1;

  let rowNum = 0;
  let rowStart = 0;
  let rowOpenEnd = 0;
  let col = 0;
  // The cell being read.
  let cStart = 0;
  let cType: string | undefined;
  let cCm: number | undefined;
  let inCell = false;
  let fAttrs: Record<string, string> | undefined;
  let fText = '';
  let fStart = 0;
  let fEnd = 0;
  let vText: string | undefined;
  let isText: string | undefined;
  let where: 'f' | 'v' | 't' | '' = '';
  let inIs = false;
  let phonetic = 0;

  const inOldRange = (r: number, c: number): boolean => {
    for (const g of oldRanges) if (r >= g.top && r <= g.bottom && c >= g.left && c <= g.right) return true;
    return false;
  };

  const open = (name: string, attrs: () => Record<string, string>, selfClosing: boolean, start: number): void => {
    if (inCell) {
      if (name === 'f') {
        fAttrs = decodedAttributes(attrs());
        fText = '';
        fStart = start;
        fEnd = selfClosing ? tagEnd(text, start) : -1;
        where = 'f';
      } else if (name === 'v') {
        vText = '';
        where = 'v';
      } else if (name === 'is') {
        inIs = true;
        isText = '';
      } else if (inIs && name === 'rPh') phonetic++;
      else if (inIs && name === 't') where = 't';
      return;
    }
    if (name === 'c') {
      inCell = true;
      cStart = start;
      const a = decodedAttributes(attrs());
      const ref = a.r !== undefined ? parseCellRef(a.r) : undefined;
      col = ref ? ref.col : col + 1;
      if (ref && ref.row !== rowNum) rowNum = ref.row;
      cType = a.t;
      cCm = a.cm !== undefined ? Number(a.cm) : undefined;
      fAttrs = undefined;
      vText = undefined;
      isText = undefined;
      where = '';
      if (selfClosing) finishCell(tagEnd(text, start));
    } else if (name === 'row') {
      const r = decodedAttributes(attrs()).r;
      rowNum = r !== undefined ? Number(r) : rowNum + 1;
      col = 0;
      rowStart = start;
      rowOpenEnd = tagEnd(text, start);
      if (selfClosing) rowTags.push(rowNum, rowStart, rowOpenEnd, -1, rowOpenEnd); // -1: <row/> has no content
    } else if (name === 'sheetData') {
      const end = tagEnd(text, start);
      sheetData = { start, openEnd: end, closeStart: end, end, empty: selfClosing };
    }
  };

  const onText = (s: string): void => {
    if (!inCell) return;
    if (where === 'f') fText += s;
    else if (where === 'v') vText += s;
    else if (where === 't' && phonetic === 0) isText += s;
  };

  const close = (name: string, selfClosing: boolean, start: number, end: number): void => {
    if (selfClosing) return; // done when it opened
    if (inCell) {
      if (name === 'c') finishCell(end);
      else if (name === 'f') {
        fEnd = end;
        where = '';
      } else if (name === 'v' || name === 't') where = '';
      else if (name === 'rPh') phonetic--;
      else if (name === 'is') inIs = false;
      return;
    }
    if (name === 'row') rowTags.push(rowNum, rowStart, rowOpenEnd, start, end);
    else if (name === 'sheetData' && !sheetData.empty) sheetData = { ...sheetData, closeStart: start, end };
  };

  function finishCell(end: number): void {
    inCell = false;
    cells.push(rowNum, col, cStart, end);
    if (fAttrs !== undefined) {
      const kind = fAttrs.t === 'array' ? 'array' : fAttrs.t === 'shared' ? 'shared' : 'normal';
      let stored = fText;
      if (kind === 'shared' && fAttrs.si !== undefined) {
        const master = shared.get(fAttrs.si);
        if (stored.trim() !== '' || master === undefined) shared.set(fAttrs.si, { row: rowNum, col, stored });
        else stored = shiftFormula(master.stored, rowNum - master.row, col - master.col);
      }
      if (stored.trim() !== '') {
        const range = kind === 'array' && fAttrs.ref ? parseRange(fAttrs.ref) : undefined;
        const oldRange = range && (range.bottom > range.top || range.right > range.left) ? range : undefined;
        if (oldRange) oldRanges.push(oldRange);
        const above = lastTemplate[col];
        if (digitsRow !== rowNum) digits = String((digitsRow = rowNum));
        const template = above?.source !== undefined && fitsTemplate(stored, above.source, digits) ? above : formulaTemplate(stored, rowNum);
        if (template.source !== undefined) lastTemplate[col] = template;
        formulas.push(new FormulaCell(meta.index, rowNum, col, kind, cStart, end, fStart, fEnd, template, template.source === undefined ? stored : undefined, oldRange, cCm));
        if (cachedValues) (rows[rowNum - 1] ??= [])[col - 1] = cellValue(cType, vText, isText, strings, date1904);
        return;
      }
    }
    if (oldRanges.length > 0 && inOldRange(rowNum, col)) return; // an old array result: not input
    const value = cellValue(cType, vText, isText, strings, date1904);
    if (value !== null) (rows[rowNum - 1] ??= [])[col - 1] = value;
  }

  try {
    parseLocated(text, { open: (n, a, sc, at) => open(local(n), a, sc, at), close: (n, sc, at, end) => close(local(n), sc, at, end), text: onText }, onProgress);
  } catch (error) {
    if (error instanceof WorkbookError) throw error;
    throw new WorkbookError(`this .xlsx package cannot be read: part ${meta.path} is not well-formed XML (${(error instanceof Error ? error.message : String(error)).split('\n')[0]})`);
  }
  for (let i = 0; i < rows.length; i++) rows[i] ??= [];
  return { name: meta.name, path: meta.path, entry: meta.entry, text, rows, formulas, cells, rowTags, sheetData };
}

/** Reads the package: workbook, names, strings, metadata and every worksheet. */
export async function readPackage(zip: ZipReader, onProgress?: (done: number, total: number) => void, cachedValues = false): Promise<PackageRead> {
  const byName = new Map(zip.entries.map((e) => [e.name.replace(/^\//, ''), e]));
  const texts = new Map<string, string>();
  const text = async (path: string): Promise<string | undefined> => {
    const e = byName.get(path);
    if (!e) return undefined;
    const t = await partText(zip, e);
    texts.set(path, t);
    return t;
  };
  const rootRels = await text('_rels/.rels');
  const officeDocument = rootRels ? readRels(rootRels, '_rels/.rels').find((r) => r.type.endsWith('/officeDocument')) : undefined;
  const workbookPath = officeDocument ? resolveTarget('', officeDocument.target) : 'xl/workbook.xml';
  const workbookXml = await text(workbookPath);
  if (workbookXml === undefined) throw new WorkbookError('this package holds no workbook part; is it an .xlsx workbook?');
  const workbookRelsPath = relsPathOf(workbookPath);
  const rels = readRels((await text(workbookRelsPath)) ?? '<Relationships/>', workbookRelsPath);
  const relById = new Map(rels.map((r) => [r.id, r]));

  const sheetRefs: { name: string; rid: string }[] = [];
  const names: DefinedName[] = [];
  let date1904 = false;
  let nameAttrs: Record<string, string> | undefined;
  let nameText = '';
  parseXml(workbookXml, workbookPath, {
    open: (name, a) => {
      if (name === 'sheet') sheetRefs.push({ name: a.name ?? '', rid: a['r:id'] ?? Object.entries(a).find(([k]) => k.endsWith(':id'))?.[1] ?? '' });
      else if (name === 'workbookPr') date1904 = a.date1904 === '1' || a.date1904 === 'true';
      else if (name === 'definedName') {
        nameAttrs = a;
        nameText = '';
      }
    },
    text: (t) => {
      if (nameAttrs) nameText += t;
    },
    close: (name) => {
      if (name === 'definedName' && nameAttrs) {
        const sheet = nameAttrs.localSheetId !== undefined ? Number(nameAttrs.localSheetId) : undefined;
        names.push({ name: nameAttrs.name ?? '', formula: nameText, sheet });
        nameAttrs = undefined;
      }
    },
  });

  const ssRel = rels.find((r) => r.type.endsWith('/sharedStrings'));
  const ssPath = ssRel ? resolveTarget(workbookPath, ssRel.target) : undefined;
  const ssText = ssPath ? await text(ssPath) : undefined;
  const strings = ssText !== undefined && ssPath ? readSharedStrings(ssText, ssPath) : [];
  texts.delete(ssPath ?? '');

  const metaRel = rels.find((r) => r.type === SHEET_METADATA_REL);
  const metadataPath = metaRel ? resolveTarget(workbookPath, metaRel.target) : undefined;
  const metaText = metadataPath ? await text(metadataPath) : undefined;
  const dynamicArrayCm = metaText !== undefined && metadataPath ? findDynamicArrayCm(metaText, metadataPath) : undefined;

  await text('[Content_Types].xml');

  const sheetParts = sheetRefs
    .map((s) => ({ ...s, rel: relById.get(s.rid) }))
    .filter((s) => s.rel !== undefined && s.rel.type.endsWith('/worksheet'))
    .map((s) => ({ name: s.name, path: resolveTarget(workbookPath, s.rel!.target) }));
  if (sheetParts.length === 0) throw new WorkbookError('this package holds no worksheet; is it an .xlsx workbook?');
  const total = sheetParts.reduce((n, s) => n + (byName.get(s.path)?.size ?? 0), 0) * 2; // unpack, then parse
  let done = 0;
  const tick = (n: number) => {
    done += n;
    onProgress?.(Math.min(done, total), total);
  };
  const sheets: SheetRead[] = [];
  for (const [index, s] of sheetParts.entries()) {
    const entry = byName.get(s.path);
    if (!entry) throw new WorkbookError(`this .xlsx package cannot be read: the workbook names a sheet part ${s.path} that is not in the package`);
    const sheetText = await partText(zip, entry, tick);
    // Characters stand in for bytes here: the bar needs a share, not an exact figure.
    const scale = entry.size / Math.max(1, sheetText.length);
    sheets.push(readSheet(sheetText, { ...s, entry, index }, strings, date1904, (chars) => tick(chars * scale), cachedValues));
    await new Promise((r) => setImmediate(r)); // let the progress bar and signals through
  }
  return { entries: zip.entries, sheets, names, date1904, workbookPath, workbookRelsPath, metadataPath, dynamicArrayCm, texts };
}
