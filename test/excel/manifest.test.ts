/**
 * The offline manifest and functions.json checks (scripts/manifest-checks.ts): the real manifest
 * passes, and copies broken the ways a manifest goes wrong are each caught by the check meant for it.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { catalog, NAMESPACE } from '../../src/cells/catalog';
import { functionsJson } from '../../src/cells/metadata';
import { checkFunctionsJson, checkManifest, type Check } from '../../scripts/manifest-checks';

const root = resolve(__dirname, '../..');
const manifest = readFileSync(join(root, 'manifest.xml'), 'utf8');
const run = (xml: string) => checkManifest(xml, { namespace: NAMESPACE });
const failed = (checks: readonly Check[]) => checks.filter((c) => !c.ok);

/** Replaces exactly one occurrence, so a broken copy is broken the way the test says. */
function breakOnce(xml: string, from: string | RegExp, to: string): string {
  const matches = typeof from === 'string' ? xml.split(from).length - 1 : (xml.match(new RegExp(from, 'g')) ?? []).length;
  if (matches !== 1) throw new Error(`test setup: ${String(from)} occurs ${matches} times in manifest.xml`);
  return xml.replace(from, to);
}

/** Asserts the broken copy fails exactly the named check(s), with a message containing `detail`. */
function expectCaught(xml: string, checkName: RegExp, detail: RegExp): void {
  const bad = failed(run(xml));
  expect(bad.length, 'the broken copy should fail at least one check').toBeGreaterThan(0);
  const hit = bad.find((c) => checkName.test(c.name));
  expect(hit, `no failed check matches ${checkName}; failed: ${bad.map((c) => c.name).join(' | ')}`).toBeDefined();
  expect(hit!.detail).toMatch(detail);
}

describe('manifest.xml', () => {
  it('passes every check', () => {
    const checks = run(manifest);
    expect(failed(checks)).toEqual([]);
    expect(checks.length).toBeGreaterThanOrEqual(20);
  });

  it('catches a missing required element', () => {
    expectCaught(breakOnce(manifest, /\s*<ProviderName>[^<]*<\/ProviderName>/, ''), /required elements present/, /<ProviderName> is missing/);
    expectCaught(breakOnce(manifest, /\s*<Permissions>[^<]*<\/Permissions>/, ''), /required elements present/, /<Permissions> is missing/);
  });

  it('catches an element out of schema order', () => {
    const version = manifest.match(/\s*<Version>[^<]*<\/Version>/)![0];
    const swapped = breakOnce(manifest, version, '').replace('</ProviderName>', `</ProviderName>${version}`);
    expectCaught(swapped, /schema order/, /Version comes after ProviderName/);
  });

  it('catches an element the schema does not allow there', () => {
    expectCaught(breakOnce(manifest, '<Hosts>\n    <Host Name', '<Colour>plum</Colour>\n  <Hosts>\n    <Host Name'), /schema order/, /Colour .* not a child/);
  });

  it('catches an http:// URL', () => {
    const bad = breakOnce(manifest, 'DefaultValue="https://localhost:3000/functions.js"', 'DefaultValue="http://localhost:3000/functions.js"');
    expectCaught(bad, /every URL is HTTPS/, /bt:Url@DefaultValue: "http:\/\/localhost:3000\/functions\.js" is not HTTPS/);
  });

  it('catches a 33-character resource id, and a resid that names no resource', () => {
    const long = 'Fluxbook.Functions.MetadataLong1'; // 32 characters: still allowed
    expect(long).toHaveLength(32);
    const ok = manifest.replaceAll('Fluxbook.Functions.Metadata"', `${long}"`);
    expect(failed(run(ok))).toEqual([]);
    const tooLong = `${long}X`;
    expect(tooLong).toHaveLength(33);
    const bad = manifest.replaceAll('Fluxbook.Functions.Metadata"', `${tooLong}"`);
    expectCaught(bad, /resource ids unique and 1–32/, /"Fluxbook\.Functions\.MetadataLong1X" is 33 characters/);
    expectCaught(bad, /every resid resolves/, /resid "Fluxbook\.Functions\.MetadataLong1X" is 33 characters/);
    const dangling = breakOnce(manifest, '<SourceLocation resid="Fluxbook.Functions.Page"/>', '<SourceLocation resid="Fluxbook.Functions.Pages"/>');
    expectCaught(dangling, /every resid resolves/, /resid "Fluxbook\.Functions\.Pages" names no resource/);
  });

  it('catches XML that is not well-formed', () => {
    const checks = run(breakOnce(manifest, '</Permissions>', '</Permission>'));
    expect(checks).toHaveLength(1);
    expect(checks[0]).toMatchObject({ ok: false, name: expect.stringMatching(/well-formed/) });
    expect(checks[0]!.detail).toMatch(/Permission/);
  });

  it('catches a wrong root namespace or type', () => {
    expectCaught(
      breakOnce(manifest, 'xmlns="http://schemas.microsoft.com/office/appforoffice/1.1"', 'xmlns="http://schemas.microsoft.com/office/appforoffice/1.0"'),
      /root element is OfficeApp/,
      /appforoffice\/1\.0/,
    );
    expectCaught(breakOnce(manifest, 'xsi:type="TaskPaneApp"', 'xsi:type="ContentApp"'), /TaskPaneApp/, /ContentApp/);
  });

  it('catches a bad Id, Version or Permissions', () => {
    expectCaught(breakOnce(manifest, /<Id>[^<]*<\/Id>/, '<Id>fluxbook</Id>'), /Id is a GUID/, /fluxbook/);
    expectCaught(breakOnce(manifest, '<Version>0.1.0.0</Version>', '<Version>0.1.0</Version>'), /Version is n\.n\.n\.n/, /0\.1\.0/);
    const write = breakOnce(manifest, '<Permissions>Restricted</Permissions>', '<Permissions>ReadWriteDocument</Permissions>');
    expect(failed(run(write)).map((c) => c.name)).toEqual(['Permissions is Restricted, the least level (custom functions call no document API)']);
    expectCaught(breakOnce(manifest, '<Permissions>Restricted</Permissions>', '<Permissions>Everything</Permissions>'), /Permissions is one of/, /Everything/);
  });

  it('catches a wrong host, a missing extension point part, wrong file names and a wrong namespace', () => {
    expectCaught(breakOnce(manifest, '<Host Name="Workbook"/>', '<Host Name="Document"/>'), /Hosts is exactly/, /Document/);
    expectCaught(breakOnce(manifest, /\s*<Page>\s*<SourceLocation[^>]*>\s*<\/Page>/, ''), /CustomFunctions ExtensionPoint/, /Script, Metadata, Namespace/);
    expectCaught(breakOnce(manifest, 'localhost:3000/functions.json', 'localhost:3000/metadata.json'), /Metadata URL ends in functions\.json/, /metadata\.json/);
    expectCaught(breakOnce(manifest, 'localhost:3000/functions.js"', 'localhost:3000/bundle.js"'), /Script URL ends in functions\.js/, /bundle\.js/);
    expectCaught(breakOnce(manifest, 'DefaultValue="XFMR"', 'DefaultValue="XFRM"'), /namespace is XFMR/, /XFRM/);
  });

  it('makes `npm run validate` exit 1 with the failed check named', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fluxbook-validate-'));
    try {
      const file = join(dir, 'manifest.xml');
      writeFileSync(file, breakOnce(manifest, 'DefaultValue="https://localhost:3000/functions.js"', 'DefaultValue="http://localhost:3000/functions.js"'));
      // An empty dist folder: the functions.json check must fail too, with the build hint.
      const r = spawnSync(process.execPath, ['--import', 'tsx', join(root, 'scripts/validate.ts'), file, dir], { encoding: 'utf8' });
      expect(r.status).toBe(1);
      expect(r.stdout).toMatch(/^FAIL manifest\.xml: every URL is HTTPS/m);
      expect(r.stdout).toMatch(/^ok {3}manifest\.xml: Id is a GUID/m);
      expect(r.stderr).toMatch(/run `npm run build` first/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('functions.json checks', () => {
  const good = functionsJson(catalog);
  const copy = () => structuredClone(good) as { functions: Record<string, any>[] };

  it('pass on the functions.json the declarations generate', () => {
    expect(failed(checkFunctionsJson(good))).toEqual([]);
  });

  it('catch a duplicate id, a lower-case id and a name that differs from its id', () => {
    const dup = copy();
    dup.functions.push({ ...dup.functions[0]! });
    expect(failed(checkFunctionsJson(dup)).map((c) => c.name)).toEqual(['function ids unique']);
    const lower = copy();
    lower.functions[0]!.id = 'turns.ratio';
    lower.functions[0]!.name = 'turns.ratio';
    expect(failed(checkFunctionsJson(lower)).map((c) => c.name)).toEqual(['function ids upper-case [A-Z0-9._], starting with a letter']);
    const renamed = copy();
    renamed.functions[0]!.name = 'TURNS';
    expect(failed(checkFunctionsJson(renamed)).map((c) => c.detail)).toEqual([`${renamed.functions[0]!.id}: name "TURNS"`]);
  });

  it('catch a parameter without dimensionality and an optional parameter before a required one', () => {
    const noDim = copy();
    delete noDim.functions.find((f) => f.id === 'RATIO')!.parameters[0].dimensionality;
    expect(failed(checkFunctionsJson(noDim))[0]!.detail).toBe('RATIO parameter hv_v: no dimensionality');
    const order = copy();
    const eff = order.functions.find((f) => f.id === 'EFF')!;
    eff.parameters[0].optional = true;
    expect(failed(checkFunctionsJson(order))[0]!.detail).toBe('EFF: required p0_w follows optional kva');
  });

  it('catch an untyped result and an empty list', () => {
    const untyped = copy();
    delete untyped.functions[1]!.result.type;
    expect(failed(checkFunctionsJson(untyped)).map((c) => c.name)).toEqual(['every result is typed (type and dimensionality)']);
    expect(failed(checkFunctionsJson({ functions: [] }))).toHaveLength(1);
  });
});
