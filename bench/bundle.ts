/** Size of the add-in bundle Excel downloads: dist/functions.js as webpack minified it, and gzipped. */
import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import type { BenchRow } from './harness';

export function bundleSize(path = 'dist/functions.js'): BenchRow {
  const bytes = readFileSync(path);
  const kb = bytes.length / 1024;
  const gz = gzipSync(bytes, { level: 9 }).length / 1024;
  return {
    measure: 'bundle: dist/functions.js minified (gzipped)',
    ours: `${kb.toFixed(1)} KB (${gz.toFixed(1)} KB)`,
    reference: '—',
    ratio: '—',
    goal: '≤ 60 KB minified',
    met: kb <= 60,
  };
}
