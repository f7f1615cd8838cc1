/**
 * `npm run docs`: regenerates everything the docs derive from the declarations — the README's
 * function list and "First sheet" walk-through (each between its marker comments) and
 * docs/functions.md. The examples are computed by the embedded engine; tests fail when any of
 * these files is stale.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { withFirstSheet } from './first-sheet';
import { FUNCTIONS_DOC, functionsDoc } from './functions-doc';
import { withFunctionList } from './readme-functions';

export const README = 'README.md';

/** The README with both generated sections brought up to date. */
export const currentReadme = (readme: string): string => withFirstSheet(withFunctionList(readme));

function update(path: string, next: string): void {
  let before: string | undefined;
  try {
    before = readFileSync(path, 'utf8');
  } catch {
    before = undefined;
  }
  if (before === next) {
    console.log(`${path} is current`);
    return;
  }
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, next);
  console.log(`${path} rewritten`);
}

if (process.argv[1] && /[\\/]docs\.ts$/.test(process.argv[1])) {
  update(README, currentReadme(readFileSync(README, 'utf8')));
  update(FUNCTIONS_DOC, functionsDoc());
}
