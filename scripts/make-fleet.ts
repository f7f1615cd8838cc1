/**
 * Writes a large fleet workbook for timing `fluxbook calc`: ROWS units (invented, cycled from the
 * Fernhill Works fleet with a varying load), each row with 4 XFMR formulas — efficiency, losses,
 * ratio deviation, rated current — one formula per cell, as a user fills them down.
 *   --shared   the formulas as Excel stores a filled-down column (`<f t="shared">`, ECMA-376 Part 1 §18.3.1.40)
 *   --native   the same four results as native formulas (for another spreadsheet to recalculate)
 *   --loads    instead: one unit's loads, one XFMR.LOSSES a row and XFMR.ELOSS over the column
 *
 * Run: npm run make-fleet -- OUT.xlsx [ROWS=10000] [--shared | --native]
 *
 * The package is laid out by hand from ECMA-376 (worksheet, workbook, relationships, content
 * types) and zipped with fflate: a writer of text, so it takes seconds for 100,000 rows.
 */
import { writeFileSync } from 'node:fs';
import { strToU8, zipSync } from 'fflate';
import { FLEET, measuredRatio } from '../src/demo';

export type FleetFormulas = 'xfmr' | 'shared' | 'native';

const HEADERS = ['Unit', 'kVA', 'HV (V)', 'LV (V)', 'Vector group', 'No-load loss (W)', 'Load loss (W)', 'Load', 'Measured ratio', 'Efficiency', 'Losses (W)', 'Ratio deviation', 'Rated current (A)'];
const esc = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const text = (ref: string, s: string) => `<c r="${ref}" t="inlineStr"><is><t>${esc(s)}</t></is></c>`;
const num = (ref: string, n: number) => `<c r="${ref}"><v>${n}</v></c>`;
const formula = (ref: string, f: string, attrs = '') => `<c r="${ref}"><f${attrs}>${esc(f)}</f></c>`;

/** The four results of row r as XFMR calls (stored as a file has them: _xldudf_ names). */
export function xfmrFormulas(r: number): string[] {
  return [
    `_xldudf_XFMR_EFF(B${r},F${r},G${r},H${r})`,
    `_xldudf_XFMR_LOSSES(F${r},G${r},H${r})`,
    `_xldudf_XFMR_RATIODEV(I${r},C${r},D${r},E${r})`,
    `_xldudf_XFMR_IRATED(B${r},D${r})`,
  ];
}

/**
 * The same four as native formulas: efficiency x·S / (x·S + P0 + x²·Pk) at unity power factor;
 * losses P0 + x²·Pk; ratio deviation (measured − declared) / declared with the declared ratio of
 * winding voltages — a delta winding has the line voltage, a star or zigzag winding line/√3 (HV
 * letter first, upper case; LV lower case: "d" marks a delta LV); rated current S / (√3·V_LV).
 */
export function nativeFormulas(r: number): string[] {
  const declared = `(IF(LEFT(E${r},1)="D",C${r},C${r}/SQRT(3))/IF(ISNUMBER(FIND("d",E${r})),D${r},D${r}/SQRT(3)))`;
  return [
    `H${r}*B${r}*1000/(H${r}*B${r}*1000+F${r}+H${r}^2*G${r})`,
    `F${r}+G${r}*H${r}^2`,
    `(I${r}-${declared})/${declared}`,
    `B${r}*1000/(SQRT(3)*D${r})`,
  ];
}

function sheetXml(rows: number, kind: FleetFormulas): string {
  const out: string[] = [
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main">',
    `<dimension ref="A1:M${rows + 1}"/><sheetData>`,
    `<row r="1">${HEADERS.map((h, j) => text(`${String.fromCharCode(65 + j)}1`, h)).join('')}</row>`,
  ];
  const cols = ['J', 'K', 'L', 'M'];
  for (let i = 0; i < rows; i++) {
    const u = FLEET[i % FLEET.length]!;
    const r = i + 2;
    const load = 0.2 + ((i * 37) % 90) / 100;
    const cells = [
      text(`A${r}`, `U-${String(i + 1).padStart(6, '0')}`),
      num(`B${r}`, u.kva),
      num(`C${r}`, u.hvV),
      num(`D${r}`, u.lvV),
      text(`E${r}`, u.vectorGroup),
      num(`F${r}`, u.p0W),
      num(`G${r}`, u.pkW),
      num(`H${r}`, load),
      num(`I${r}`, measuredRatio(u)),
    ];
    if (kind === 'native') {
      nativeFormulas(r).forEach((f, j) => cells.push(formula(`${cols[j]}${r}`, f)));
    } else if (kind === 'shared') {
      xfmrFormulas(r).forEach((f, j) =>
        cells.push(i === 0 ? formula(`${cols[j]}${r}`, f, ` t="shared" ref="${cols[j]}2:${cols[j]}${rows + 1}" si="${j}"`) : `<c r="${cols[j]}${r}"><f t="shared" si="${j}"/></c>`),
      );
    } else {
      xfmrFormulas(r).forEach((f, j) => cells.push(formula(`${cols[j]}${r}`, f)));
    }
    out.push(`<row r="${r}">${cells.join('')}</row>`);
  }
  out.push('</sheetData></worksheet>');
  return out.join('');
}

/**
 * A sheet of `rows` hourly loads of one unit (column A, per unit), each row's losses as a
 * filled-down XFMR.LOSSES (column B), and in C1 the energy lost over the whole column.
 */
function loadColumnXml(rows: number): string {
  const out: string[] = [
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData>',
  ];
  for (let r = 1; r <= rows; r++) {
    const total = r === 1 ? formula('C1', `_xldudf_XFMR_ELOSS(1000,10000,A1:A${rows})`) : '';
    out.push(`<row r="${r}">${num(`A${r}`, ((r * 37) % 90) / 100 + 0.1)}${formula(`B${r}`, `_xldudf_XFMR_LOSSES(1000,10000,A${r})`)}${total}</row>`);
  }
  out.push('</sheetData></worksheet>');
  return out.join('');
}

/** The fleet workbook as .xlsx bytes; `loads` makes the one-unit load column instead. */
export function fleetPackage(rows: number, kind: FleetFormulas | 'loads' = 'xfmr'): Buffer {
  const files = {
    '[Content_Types].xml': strToU8(
      '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/></Types>',
    ),
    '_rels/.rels': strToU8(
      '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/></Relationships>',
    ),
    'xl/workbook.xml': strToU8(
      '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<workbook xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"><sheets><sheet name="Fleet" sheetId="1" r:id="rId1"/></sheets></workbook>',
    ),
    'xl/_rels/workbook.xml.rels': strToU8(
      '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/></Relationships>',
    ),
    'xl/worksheets/sheet1.xml': strToU8(kind === 'loads' ? loadColumnXml(rows) : sheetXml(rows, kind)),
  };
  return Buffer.from(zipSync(files, { level: kind === 'loads' ? 1 : 6 }));
}

if (require.main === module && /make-fleet\.[jt]s$/.test(process.argv[1] ?? '')) {
  const args = process.argv.slice(2);
  const flags = new Set(args.filter((a) => a.startsWith('--')));
  const [out, count] = args.filter((a) => !a.startsWith('--'));
  if (!out || !/\.xlsx$/i.test(out)) {
    console.error('usage: npm run make-fleet -- OUT.xlsx [ROWS=10000] [--shared | --native | --loads]');
    process.exit(2);
  }
  const rows = Number(count ?? 10_000);
  const kind = flags.has('--loads') ? 'loads' : flags.has('--native') ? 'native' : flags.has('--shared') ? 'shared' : 'xfmr';
  writeFileSync(out, fleetPackage(rows, kind));
  const what = kind === 'loads' ? 'hourly loads with XFMR.LOSSES each and XFMR.ELOSS over all' : `units × 4 ${kind === 'native' ? 'native' : 'XFMR'} formulas${kind === 'shared' ? ' (shared, as Excel stores a filled-down column)' : ''}`;
  console.log(`${out}: ${rows.toLocaleString('en-US')} ${what}`);
}
