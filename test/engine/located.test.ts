import { describe, expect, it } from 'vitest';
import { parseLocated, tagEnd } from '../../src/engine/located';

/** Every event as text, with the positions it reports. */
function events(xml: string): string[] {
  const out: string[] = [];
  parseLocated(xml, {
    open: (name, attrs, selfClosing, start) => out.push(`<${name}${selfClosing ? '/' : ''}@${start} ${JSON.stringify(attrs())}`),
    close: (name, selfClosing, start, end) => out.push(selfClosing ? `/${name}` : `</${name}@${start}-${end}`),
    text: (t) => out.push(`'${t}'`),
  });
  return out;
}

describe('worksheet elements with their positions in the text', () => {
  it('gives each tag the index of its own "<", past the declaration, comments, CDATA and instructions', () => {
    const xml = '\uFEFF<?xml version="1.0"?>\n<!-- a <comment> --><w><c r="A1"><v>1</v></c><?pi <x>?><c r="B1"/><f><![CDATA[<y>]]></f></w>';
    const at = (s: string) => xml.indexOf(s);
    expect(events(xml)).toEqual([
      `<w@${at('<w>')} {}`,
      `<c@${at('<c r="A1">')} {"r":"A1"}`,
      `<v@${at('<v>')} {}`,
      "'1'",
      `</v@${at('</v>')}-${at('</v>') + 4}`,
      `</c@${at('</c>')}-${at('</c>') + 4}`,
      `<c/@${at('<c r="B1"/>')} {"r":"B1"}`,
      '/c',
      `<f@${at('<f>')} {}`,
      "'<y>'",
      `</f@${at('</f>')}-${at('</f>') + 4}`,
      `</w@${at('</w>')}-${xml.length}`,
    ]);
    expect(xml.slice(at('<c r="B1"/>'), tagEnd(xml, at('<c r="B1"/>')))).toBe('<c r="B1"/>');
  });

  it('decodes the five XML entities and character references in text', () => {
    expect(events('<a>&lt;&amp;&#65;&#x42;&quot;</a>')).toContain(`'<&AB"'`);
  });

  it('hands on line ends as XML 1.0 §2.11 has them: CR LF and a lone CR as LF, a CR written as &#13; kept', () => {
    expect(events('<a>1\r\n2\r3&#13;4</a>')).toContain(`'1\n2\n3\r4'`);
    expect(events('<a><![CDATA[x\r\ny]]></a>')).toContain(`'x\ny'`);
  });

  it('finds the end of a tag whose attribute value holds ">"', () => {
    const xml = '<a b="x>y" c=\'>\'/>';
    expect(tagEnd(xml, 0)).toBe(xml.length);
  });

  // XML 1.0 well-formedness constraints (W3C REC-xml, §2.1 document, §2.4 character data, §3.1 tags).
  it.each([
    ['a closing tag that does not match', '<a><b></a>'],
    ['an element left open', '<a><b>'],
    ['"<" inside an attribute value', '<a><b c="<"/></a>'],
    ['a bare "&" in text', '<a>x & y</a>'],
    ['an unknown entity', '<a>&nbsp;</a>'],
    ['two root elements', '<a/><b/>'],
    ['an attribute without quotes', '<a x=1/>'],
    ['an attribute given twice', '<a x="1" x="2"/>'],
    ['a document type declaration', '<!DOCTYPE a [<!ENTITY e "x">]><a>&e;</a>'],
    ['no element at all', '<?xml version="1.0"?>'],
  ])('refuses %s', (_what, xml) => {
    expect(() => events(xml)).toThrow();
  });
});
