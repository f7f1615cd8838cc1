import { readFileSync } from 'node:fs';
import { openZip } from './src/engine/zip';
import { readPackage } from './src/engine/read';
import { computeColumns } from './src/engine/columns';
import { simpleCall } from './src/engine/formulas';
(async () => {
  const bytes = readFileSync(process.argv[2]!);
  const read = await readPackage(await openZip(bytes));
  let t = performance.now();
  let n = 0; for (const f of read.sheets[0]!.formulas) if (simpleCall(f.engine, f.row)) n++;
  console.log('simpleCall', (performance.now() - t).toFixed(0), n);
  t = performance.now();
  const m = computeColumns(read, () => {});
  console.log('columns', (performance.now() - t).toFixed(0), m.size);
})();
