/** The progress bar: only for big workbooks, only on a terminal, stage by stage, and the terminal given back. */
import { PassThrough } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { BAR_INPUT_BYTES, progress, RESTORE_TERMINAL, restoreTerminal, wantsBar } from '../../src/cli/progress';

function stream(isTTY: boolean): NodeJS.WriteStream & { text: () => string } {
  const s = new PassThrough() as unknown as NodeJS.WriteStream & { text: () => string };
  let written = '';
  s.on('data', (d: Buffer) => (written += d.toString()));
  Object.assign(s, { isTTY, columns: 100, rows: 30, text: () => written, cursorTo: () => true, clearLine: () => true });
  return s;
}

describe('the progress bar', () => {
  it('is wanted for inputs of more than 1 MB', () => {
    expect(wantsBar(BAR_INPUT_BYTES)).toBe(false);
    expect(wantsBar(BAR_INPUT_BYTES + 1)).toBe(true);
  });

  it('writes nothing when the stream is not a terminal', () => {
    const s = stream(false);
    const bar = progress(true, s);
    bar.update('reading', 10, 100);
    bar.update('calculating', 50, 100);
    bar.stop();
    expect(s.text()).toBe('');
  });

  it('shows each stage with its own share done, and gives the cursor and line wrapping back when it stops', () => {
    const s = stream(true);
    const bar = progress(true, s);
    bar.update('reading', 25, 100);
    bar.update('calculating', 3, 4);
    bar.update('writing', 1, 2);
    bar.stop();
    const text = s.text();
    expect(text).toMatch(/reading \[[^\]]*\] 25%/);
    expect(text).toMatch(/calculating \[[^\]]*\] 75%/);
    expect(text).toMatch(/writing \[[^\]]*\] 50%/);
    expect(text.endsWith(RESTORE_TERMINAL)).toBe(true);
    const quiet = stream(true);
    progress(false, quiet).update('reading', 1, 10);
    expect(quiet.text()).toBe('');
  });

  it('gives the terminal back on an interruption while it is drawn', () => {
    const s = stream(true);
    progress(true, s).update('calculating', 1, 10);
    restoreTerminal();
    expect(s.text().endsWith(RESTORE_TERMINAL)).toBe(true);
  });
});
