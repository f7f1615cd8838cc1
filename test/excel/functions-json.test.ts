/**
 * functions.json is generated from the declarations (src/cells/metadata.ts + catalog); this
 * snapshot shows every change to what Excel is told in review. Adding a function changes it:
 * refresh with `npx vitest run -u` and read the diff. When dist/ exists, the built file must be
 * the same text.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { catalog } from '../../src/cells/catalog';
import { functionsJson } from '../../src/cells/metadata';
import { checkFunctionsJson } from '../../scripts/manifest-checks';

const built = join(resolve(__dirname, '../..'), 'dist/functions.json');
// As webpack.config.js's FunctionsJsonPlugin writes it.
const generated = JSON.stringify(functionsJson(catalog), null, 2) + '\n';

describe('functions.json', () => {
  it('matches the reviewed snapshot', async () => {
    await expect(generated).toMatchFileSnapshot('__snapshots__/functions.json');
  });

  it('lists every declaration once, in catalog order, and passes the validate checks', () => {
    const json = JSON.parse(generated) as ReturnType<typeof functionsJson>;
    expect(json.functions.map((f) => f.id)).toEqual(catalog.map((d) => d.name));
    expect(checkFunctionsJson(json).filter((c) => !c.ok)).toEqual([]);
  });

  it.runIf(existsSync(built))('equals dist/functions.json from the build', () => {
    expect(readFileSync(built, 'utf8')).toBe(generated);
  });
});
