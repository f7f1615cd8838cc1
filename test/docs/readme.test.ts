import { readFileSync } from 'node:fs';
import { expect, it } from 'vitest';
import { withFunctionList } from '../../scripts/readme-functions';

it('the README function list matches the declarations (run `npm run docs` when this fails)', () => {
  const readme = readFileSync('README.md', 'utf8');
  expect(withFunctionList(readme)).toBe(readme);
});
