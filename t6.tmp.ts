import { readFileSync } from 'node:fs';
import { openZip } from './src/engine/zip';
import { readPackage } from './src/engine/read';
import { computeColumns } from './src/engine/columns';
(async () => {
  const bytes = readFileSync(process.argv[2]!);
  const read = await readPackage(await openZip(bytes));
  for (let k = 0; k < 3; k++) {
  let t = performance.now();
  const m = computeColumns(read, () => {});
  console.log('columns', (performance.now() - t).toFixed(0), m.length);
  }
})();
