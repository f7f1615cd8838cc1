/** Entry of the `fluxbook` command (package.json "bin"); the program is in main.ts, the engine worker in calc.ts. */
import { isEngineWorker, runEngineWorker } from './calc';
import { main } from './main';

if (isEngineWorker()) {
  runEngineWorker();
} else {
  void main(process.argv.slice(2)).then((code) => {
    process.exitCode = code;
  });
}
