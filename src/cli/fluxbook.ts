/** Entry of the `fluxbook` command (package.json "bin"); the program is in main.ts. */
import { main } from './main';

void main(process.argv.slice(2)).then((code) => {
  process.exitCode = code;
});
