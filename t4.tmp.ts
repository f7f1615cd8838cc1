import { readFileSync } from 'node:fs';
import { calculateWorkbook } from './src/engine/xlsx';
(async () => {
  const bytes = readFileSync(process.argv[2]!);
  const t0 = performance.now(); let stage = ''; 
  const r = await calculateWorkbook(bytes, { limits: { maxUnpackedBytes: 2**30, maxPartBytes: 2**29, memoryBytes: 2**40 }, onProgress: (s) => { if (s !== stage) { console.log(s, (performance.now() - t0).toFixed(0)); stage = s; } } });
  console.log('done', (performance.now() - t0).toFixed(0), r.formulas, r.errors, process.memoryUsage().rss / 1e6);
})();
