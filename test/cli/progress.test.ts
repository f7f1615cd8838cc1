/** The progress bar: only for big workbooks, only on a terminal. */
import { PassThrough } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { progress, wantsBar } from '../../src/cli/progress';

function stream(isTTY: boolean): NodeJS.WriteStream & { text: () => string } {
  const s = new PassThrough() as unknown as NodeJS.WriteStream & { text: () => string };
  let written = '';
  s.on('data', (d: Buffer) => (written += d.toString()));
  Object.assign(s, { isTTY, columns: 100, rows: 30, text: () => written });
  return s;
}

describe('the progress bar', () => {
  it('is wanted past 50,000 formula cells or a profile longer than 8,760 steps', () => {
    expect(wantsBar(50_000, 8_760)).toBe(false);
    expect(wantsBar(50_001, 10)).toBe(true);
    expect(wantsBar(10, 8_761)).toBe(true);
  });

  it('writes nothing when the stream is not a terminal', () => {
    const s = stream(false);
    const bar = progress(true, s);
    bar.stage('calculating', 1000);
    for (let i = 0; i < 1000; i++) bar.tick();
    bar.stop();
    expect(s.text()).toBe('');
  });

  it('draws on a terminal, and not at all when not wanted', () => {
    const s = stream(true);
    const bar = progress(true, s);
    bar.stage('calculating', 1000);
    for (let i = 0; i < 1000; i++) bar.tick();
    bar.stop();
    expect(s.text()).toMatch(/calculating/);
    const quiet = stream(true);
    progress(false, quiet).stage('calculating', 10);
    expect(quiet.text()).toBe('');
  });
});
