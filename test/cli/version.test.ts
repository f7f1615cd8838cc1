/** `fluxbook --version` prints the version package.json declares. */
import { describe, expect, it } from 'vitest';
import packageJson from '../../package.json';
import { fluxbook } from './run';

describe('fluxbook --version', () => {
  it('is the package version', () => {
    const r = fluxbook('--version');
    expect(r.status).toBe(0);
    expect(r.stdout.trim()).toBe(packageJson.version);
  });
});
