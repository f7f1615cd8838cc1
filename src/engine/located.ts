/**
 * A worksheet part's elements with where each stands in the part's text, for the reader to record
 * and the writer to replace single cells by position.
 *
 * The parsing is saxen's (a fast streaming XML parser; its errors, and its warnings about
 * attributes, refuse the part). Where a tag stands follows from XML itself: `<` cannot occur in
 * text or in an attribute value (XML 1.0 §2.4, §3.1 AttValue), so each tag saxen reports starts at
 * the next `<` of the text, once comments, CDATA sections and processing instructions are stepped
 * over. Every such position is checked against the tag's name, so a part whose text and events
 * ever disagree is refused rather than patched in the wrong place. A document type declaration is
 * refused: SpreadsheetML has none, and entity definitions are a known way to blow up a reader.
 */
import { decode, Parser } from 'saxen';

export interface LocatedHandlers {
  /** A start tag (or an empty-element tag, `selfClosing`) whose `<` is at `start`; `attrs` as written, not yet decoded. */
  readonly open: (name: string, attrs: () => Record<string, string>, selfClosing: boolean, start: number) => void;
  /** An end tag `</name>` from `start` to `end`; for an empty-element tag, `start` and `end` are -1. */
  readonly close: (name: string, selfClosing: boolean, start: number, end: number) => void;
  /** Character data, entities decoded; a CDATA section's text as it is. */
  readonly text: (text: string) => void;
}

/** Entity and character references XML 1.0 allows (§4.1, §4.6): anything else after `&` is not XML. */
const BAD_REFERENCE = /&(?!(?:lt|gt|amp|quot|apos|#[0-9]+|#x[0-9A-Fa-f]+);)/;

/**
 * Line ends as an XML processor hands them on (XML 1.0 §2.11): CR LF and a lone CR become LF. A
 * CR written as a reference (&#13;) is decoded afterwards, so it stays.
 */
const lineEnds = (raw: string): string => (raw.indexOf('\r') < 0 ? raw : raw.replace(/\r\n?/g, '\n'));

/** Text with its references decoded; a bare `&` or an unknown entity is an error. */
export function decodeText(raw: string): string {
  if (raw.indexOf('&') < 0) return raw;
  if (BAD_REFERENCE.test(raw)) throw new Error(`a '&' that starts no character or entity reference (${JSON.stringify(raw.slice(0, 40))})`);
  return decode(raw);
}

/** The index just past the `>` that ends the tag starting at `start`; quoted attribute values may hold `>`. */
export function tagEnd(text: string, start: number): number {
  let quote = 0;
  for (let i = start + 1; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (quote !== 0) {
      if (c === quote) quote = 0;
    } else if (c === 34 || c === 39) quote = c;
    else if (c === 62) return i + 1;
  }
  throw new Error('a tag is not closed');
}

/** Start tags between two reports of progress. */
const PROGRESS_EVERY = 1 << 16;

/**
 * Parses `text` (a byte-order mark at its start is passed over), calling `h` in document order;
 * `onChars` hears how much was parsed. The text is parsed whole: it is in memory already, and
 * saxen's streaming would copy each chunk's unparsed rest again. Throws an Error naming what is
 * wrong when the text is not well-formed.
 */
export function parseLocated(text: string, h: LocatedHandlers, onChars?: (n: number) => void): void {
  let cursor = 0;
  let depth = 0;
  let roots = 0;
  const next = (): number => {
    const at = text.indexOf('<', cursor);
    if (at < 0) throw new Error('the parser and the text are out of step');
    return at;
  };
  /** The `<` of the next tag, checked to be `<name` or `</name` followed by the end of the name. */
  const tagAt = (name: string, closing: boolean): number => {
    const at = next();
    const from = closing ? at + 2 : at + 1;
    const after = text.charCodeAt(from + name.length);
    if ((closing && text.charCodeAt(at + 1) !== 47) || !text.startsWith(name, from) || !(after === 62 || after === 47 || after === 32 || after === 9 || after === 10 || after === 13)) {
      throw new Error(`the parser and the text are out of step at <${name}>`);
    }
    return at;
  };
  /** Steps over a markup declaration that ends with `terminator`. */
  const skip = (terminator: string): void => {
    const at = next();
    const end = text.indexOf(terminator, at);
    if (end < 0) throw new Error(`markup at ${at} is not closed`);
    cursor = end + terminator.length;
  };

  const parser = new Parser();
  let reported = 0;
  let opened = 0;
  parser.on('openTag', (name: string, attrs: () => Record<string, string>, _decode: unknown, selfClosing: boolean) => {
    if (depth === 0 && ++roots > 1) throw new Error('more than one root element');
    const start = tagAt(name, false);
    cursor = start + 1;
    if (++opened === PROGRESS_EVERY) {
      opened = 0;
      onChars?.(cursor - reported);
      reported = cursor;
    }
    if (!selfClosing) depth++;
    h.open(name, attrs, selfClosing, start);
  });
  parser.on('closeTag', (name: string, _decode: unknown, selfClosing: boolean) => {
    if (selfClosing) return h.close(name, true, -1, -1);
    const start = tagAt(name, true);
    const end = text.charCodeAt(start + 2 + name.length) === 62 ? start + 3 + name.length : text.indexOf('>', start) + 1;
    cursor = end;
    depth--;
    h.close(name, false, start, end);
  });
  parser.on('text', (raw: string) => h.text(decodeText(lineEnds(raw))));
  parser.on('cdata', (raw: string) => {
    skip(']]>');
    h.text(lineEnds(raw));
  });
  parser.on('comment', () => skip('-->'));
  parser.on('question', () => skip('?>'));
  parser.on('attention', () => {
    throw new Error('a document type declaration (SpreadsheetML parts have none)');
  });
  parser.on('warn', (error: Error) => {
    throw error;
  });
  parser.on('error', (error: Error) => {
    throw error;
  });
  const from = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  cursor = from;
  parser.parse(from === 0 ? text : text.slice(from));
  onChars?.(text.length - reported);
  if (roots === 0) throw new Error('no root element');
  if (depth !== 0) throw new Error('an element is not closed');
}
