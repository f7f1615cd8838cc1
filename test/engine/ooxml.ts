/**
 * Minimal .xlsx packages written by hand from the Office Open XML standard (ECMA-376 Part 1,
 * SpreadsheetML: the workbook, worksheet and cell elements; Part 2, Open Packaging Conventions:
 * [Content_Types].xml and the relationship parts), zipped with jszip. Test input only: nothing here
 * was copied from a file made by a spreadsheet program.
 */
import JSZip from 'jszip';

const MAIN = 'http://schemas.openxmlformats.org/spreadsheetml/2006/main';
const REL = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships';
const PKG_REL = 'http://schemas.openxmlformats.org/package/2006/relationships';

export interface HandSheet {
  readonly name: string;
  /** The <sheetData> children: <row r="1"><c r="A1">…</c></row>… */
  readonly rows: string;
}

const esc = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** A cell holding a number. */
export const num = (ref: string, v: number): string => `<c r="${ref}"><v>${v}</v></c>`;
/** A cell holding text, inline (no shared-string part needed). */
export const str = (ref: string, v: string): string => `<c r="${ref}" t="inlineStr"><is><t>${esc(v)}</t></is></c>`;
/** A cell holding a formula, as a file stores it (no "="), with no cached value. */
export const fml = (ref: string, f: string, attrs = ''): string => `<c r="${ref}"><f${attrs}>${esc(f)}</f></c>`;
export const row = (r: number, ...cells: string[]): string => `<row r="${r}">${cells.join('')}</row>`;

/** `definedNames`: a `<definedNames>` element for the workbook part, if any. */
export async function handMadeXlsx(sheets: readonly HandSheet[], definedNames = ''): Promise<Buffer> {
  const zip = new JSZip();
  zip.file(
    '[Content_Types].xml',
    `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">
<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/>
<Default Extension="xml" ContentType="application/xml"/>
<Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>
${sheets.map((_, i) => `<Override PartName="/xl/worksheets/sheet${i + 1}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>`).join('\n')}
</Types>`,
  );
  zip.file(
    '_rels/.rels',
    `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Relationships xmlns="${PKG_REL}">
<Relationship Id="rId1" Type="${REL}/officeDocument" Target="xl/workbook.xml"/>
</Relationships>`,
  );
  zip.file(
    'xl/workbook.xml',
    `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<workbook xmlns="${MAIN}" xmlns:r="${REL}">
<sheets>${sheets.map((s, i) => `<sheet name="${esc(s.name)}" sheetId="${i + 1}" r:id="rId${i + 1}"/>`).join('')}</sheets>${definedNames}
</workbook>`,
  );
  zip.file(
    'xl/_rels/workbook.xml.rels',
    `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Relationships xmlns="${PKG_REL}">
${sheets.map((_, i) => `<Relationship Id="rId${i + 1}" Type="${REL}/worksheet" Target="worksheets/sheet${i + 1}.xml"/>`).join('\n')}
</Relationships>`,
  );
  sheets.forEach((s, i) =>
    zip.file(
      `xl/worksheets/sheet${i + 1}.xml`,
      `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<worksheet xmlns="${MAIN}"><sheetData>${s.rows}</sheetData></worksheet>`,
    ),
  );
  return zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
}

/** The text of one part of a package (to read the XML a save produced). */
export async function partText(bytes: Buffer, path: string): Promise<string> {
  const zip = await JSZip.loadAsync(bytes);
  const part = zip.file(path);
  if (!part) throw new Error(`no part ${path}`);
  return part.async('string');
}

/** The package with one part's text replaced (to change a value as a user would). */
export async function replacePart(bytes: Buffer, path: string, text: string): Promise<Buffer> {
  const zip = await JSZip.loadAsync(bytes);
  zip.file(path, text);
  return zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
}
