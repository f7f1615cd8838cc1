/**
 * `npm run validate`: checks manifest.xml and the built dist/functions.json offline, one line per
 * check, and exits 1 if any fails. No schema validation service is called (see manifest-checks.ts).
 * Usage: tsx scripts/validate.ts [manifest.xml [dist-folder]] (defaults: the repository's own).
 */
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join, resolve } from 'node:path';
import { NAMESPACE } from '../src/cells/catalog';
import { checkFunctionsJson, checkManifest, formatCheck, manifestPaths, type Check } from './manifest-checks';

const root = resolve(__dirname, '..');
const manifestFile = resolve(process.argv[2] ?? join(root, 'manifest.xml'));
const dist = resolve(process.argv[3] ?? join(root, 'dist'));
const functionsFile = join(dist, 'functions.json');
// The development origin is the one webpack serves on; read it from there rather than repeat it.
const { DEV_ORIGIN } = createRequire(__filename)('../webpack.config.js') as { DEV_ORIGIN: string };

function main(): number {
  const lines: string[] = [];
  const failures: string[] = [];
  const report = (scope: string, checks: readonly Check[]) => {
    for (const c of checks) {
      lines.push(formatCheck(c, scope));
      if (!c.ok) failures.push(`${scope}: ${c.name}: ${c.detail}`);
    }
  };

  const xml = readFileSync(manifestFile, 'utf8');
  const manifestChecks = checkManifest(xml, { namespace: NAMESPACE });
  report('manifest.xml', manifestChecks);

  if (!existsSync(functionsFile)) {
    report('dist', [{ name: 'dist/functions.json exists', ok: false, detail: 'missing: run `npm run build` first (npm test builds it)' }]);
  } else {
    let json: unknown;
    try {
      json = JSON.parse(readFileSync(functionsFile, 'utf8'));
      report('dist/functions.json', [{ name: 'is valid JSON', ok: true, detail: '' }]);
    } catch (error) {
      report('dist/functions.json', [{ name: 'is valid JSON', ok: false, detail: (error as Error).message }]);
    }
    if (json !== undefined) report('dist/functions.json', checkFunctionsJson(json));
    // The manifest's development URLs must name files the build emits (catches a renamed output).
    if (manifestChecks[0]?.ok) {
      const missing = manifestPaths(xml, DEV_ORIGIN).filter((p) => !existsSync(join(dist, p)));
      report('manifest.xml', [
        { name: `every ${DEV_ORIGIN} URL names a file in dist/`, ok: missing.length === 0, detail: missing.map((p) => `dist${p} is missing`).join('; ') },
      ]);
    }
  }

  console.log(lines.join('\n'));
  console.log('(offline checks only: no schema validation service was called)');
  if (failures.length > 0) {
    console.error(`\nvalidate: ${failures.length} of ${lines.length} checks failed:\n${failures.map((f) => `  - ${f}`).join('\n')}`);
    return 1;
  }
  console.log(`validate: all ${lines.length} checks passed`);
  return 0;
}

process.exitCode = main();
