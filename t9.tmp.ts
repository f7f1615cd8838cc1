import { readFileSync } from 'node:fs';
import { openZip } from './src/engine/zip';
import { readPackage } from './src/engine/read';
const gc = (globalThis as any).gc as () => void;
const mb = () => { gc(); return (process.memoryUsage().heapUsed / 1e6).toFixed(0) + ' MB heap, ext ' + (process.memoryUsage().external / 1e6).toFixed(0) + ', ab ' + (process.memoryUsage().arrayBuffers / 1e6).toFixed(0); };
(async () => {
  console.log('start', mb());
  const bytes = readFileSync(process.argv[2]!);
  const zip = await openZip(bytes);
  const read = await readPackage(zip);
  console.log('after read', mb());
  const s = read.sheets[0]!;
  (s as any).rows = null; console.log('without rows', mb());
  (s as any).formulas = null; console.log('without formulas', mb());
  (s as any).text = null; console.log('without text', mb());
  (s as any).cells = null; console.log('without cells', mb());
})();
