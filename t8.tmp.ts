import { readFileSync } from 'node:fs';
import { openZip } from './src/engine/zip';
import { readPackage } from './src/engine/read';
(async () => {
  const bytes = readFileSync(process.argv[2]!);
  const t = performance.now();
  const read = await readPackage(await openZip(bytes));
  console.log('read', (performance.now() - t).toFixed(0), read.sheets[0]!.formulas.length);
})();
