import { readFileSync } from 'node:fs';
import { unzipSync } from 'fflate';
import { SaxesParser } from 'saxes';
const files = unzipSync(readFileSync(process.argv[2]!));
const xml = new TextDecoder().decode(files['xl/worksheets/sheet1.xml']);
console.log('chars', xml.length);
for (const pos of [false, true]) {
  const t = performance.now();
  const p = new SaxesParser({ position: pos });
  let n = 0;
  p.on('opentag', () => n++);
  p.on('text', () => {});
  p.on('closetag', () => {});
  for (let i = 0; i < xml.length; i += 1 << 20) p.write(xml.slice(i, i + (1 << 20)));
  p.close();
  console.log('position', pos, (performance.now() - t).toFixed(0), 'ms', n);
}
