/**
 * Offline checks of manifest.xml and functions.json. The Office manifest XSDs ship in no npm
 * package and office-addin-manifest's validator posts the manifest to a web service, so this
 * checks by hand what the schemas require of an add-in-only manifest for Excel custom functions.
 *
 * What the checks rest on (docs/references.md, Add-in manifest and function metadata):
 * - "How to find the proper order of manifest elements",
 *   https://learn.microsoft.com/office/dev/add-ins/develop/manifest-element-ordering — the order of
 *   the children of <OfficeApp xsi:type="TaskPaneApp">.
 * - "OfficeApp complexType (apps for Office 1.1)", https://learn.microsoft.com/previous-versions/office/dn482624(v=office.15)
 *   — the sequence Id, AlternateId?, Version, ProviderName, DefaultLocale, DisplayName,
 *   Description, IconUrl?, HighResolutionIconUrl?, SupportUrl?, AppDomains?, Hosts?.
 * - "TaskPaneApp complexType (apps for Office 1.1)", https://learn.microsoft.com/previous-versions/office/dn482627(v=office.15)
 *   — then Requirements?, DefaultSettings, Permissions (Restricted | ReadDocument | ReadAllDocument
 *   | WriteDocument | ReadWriteDocument), Dictionary?, the VersionOverrides element of the
 *   taskpaneappversionoverrides namespace, and a signature.
 * - [MS-OWEMXML] OfficeAppBasicTypes schema, https://learn.microsoft.com/openspecs/office_file_formats/ms-owemxml/cbee9187-413a-4fd2-b131-8669609a62ea
 *   — ReferenceId (every resource id) is 1 to 32 characters; ShortString at most 125, LongString
 *   at most 250; URL at most 2048.
 * - Script, Page, Metadata and Namespace element pages (https://learn.microsoft.com/javascript/api/manifest/script,
 *   .../page, .../metadata, .../namespace) — each names a resource by resid; the namespace's resid
 *   points into ShortStrings.
 * - "Manually create JSON metadata for custom functions",
 *   https://learn.microsoft.com/office/dev/add-ins/excel/custom-functions-json — a function id is
 *   unique and holds only alphanumerics and periods; parameters and result have a type and a
 *   dimensionality.
 * IconUrl, HighResolutionIconUrl, SupportUrl, Hosts and Requirements are optional in the schema;
 * Fluxbook requires them (the icons and the support page are shown to users, Hosts and
 * Requirements keep the add-in to Excel with the custom-functions runtime).
 */
import { XMLParser, XMLValidator } from 'fast-xml-parser';

export interface Check {
  readonly name: string;
  readonly ok: boolean;
  /** Why it failed (or what was found, when it passed). */
  readonly detail: string;
}

export const NS = {
  officeApp: 'http://schemas.microsoft.com/office/appforoffice/1.1',
  versionOverrides: 'http://schemas.microsoft.com/office/taskpaneappversionoverrides',
  basicTypes: 'http://schemas.microsoft.com/office/officeappbasictypes/1.0',
  xsi: 'http://www.w3.org/2001/XMLSchema-instance',
  xml: 'http://www.w3.org/XML/1998/namespace',
} as const;

/** Children of <OfficeApp xsi:type="TaskPaneApp">, in schema order. */
export const OFFICE_APP_ORDER = [
  'Id',
  'AlternateId',
  'Version',
  'ProviderName',
  'DefaultLocale',
  'DisplayName',
  'Description',
  'IconUrl',
  'HighResolutionIconUrl',
  'SupportUrl',
  'AppDomains',
  'Hosts',
  'Requirements',
  'DefaultSettings',
  'Permissions',
  'Dictionary',
  'VersionOverrides',
] as const;

/** The children of OFFICE_APP_ORDER a Fluxbook manifest may leave out; it must have every other one. */
const OFFICE_APP_OPTIONAL: ReadonlySet<string> = new Set(['AlternateId', 'AppDomains', 'Dictionary']);

/** The children Fluxbook's manifest must have (schema-required plus our own requirements, see above). */
export const OFFICE_APP_REQUIRED = OFFICE_APP_ORDER.filter((name) => !OFFICE_APP_OPTIONAL.has(name));

export const PERMISSIONS = ['Restricted', 'ReadDocument', 'ReadAllDocument', 'WriteDocument', 'ReadWriteDocument'] as const;
export const MAX_RESOURCE_ID = 32;

/** An element with its namespace resolved. */
export interface XmlElement {
  readonly ns: string;
  readonly local: string;
  /** Attributes by their name as written (`xsi:type`, `DefaultValue`). */
  readonly attrs: Readonly<Record<string, string>>;
  /** Attributes by `{namespace}local` for prefixed ones, by local name for the rest. */
  readonly qattrs: Readonly<Record<string, string>>;
  readonly children: readonly XmlElement[];
  readonly text: string;
  /** Where it is, for messages: OfficeApp/VersionOverrides/Resources/bt:Urls/bt:Url[2]. */
  readonly path: string;
}

type OrderedNode = Record<string, unknown> & { ':@'?: Record<string, string> };

const parser = new XMLParser({
  preserveOrder: true,
  ignoreAttributes: false,
  attributeNamePrefix: '',
  parseTagValue: false,
  parseAttributeValue: false,
  trimValues: true,
  ignoreDeclaration: true,
  ignorePiTags: true,
});

class ManifestShapeError extends Error {}

function resolveTree(nodes: OrderedNode[], scope: Readonly<Record<string, string>>, parentPath: string): XmlElement[] {
  const out: XmlElement[] = [];
  const seen = new Map<string, number>();
  for (const node of nodes) {
    const tag = Object.keys(node).find((k) => k !== ':@');
    if (tag === undefined || tag === '#text' || tag === '#comment') continue;
    const attrs = { ...(node[':@'] ?? {}) };
    const inner: Record<string, string> = { ...scope };
    for (const [k, v] of Object.entries(attrs)) {
      if (k === 'xmlns') inner[''] = v;
      else if (k.startsWith('xmlns:')) inner[k.slice(6)] = v;
    }
    const colon = tag.indexOf(':');
    const prefix = colon < 0 ? '' : tag.slice(0, colon);
    const local = colon < 0 ? tag : tag.slice(colon + 1);
    const ns = inner[prefix];
    const count = (seen.get(tag) ?? 0) + 1;
    seen.set(tag, count);
    const path = `${parentPath ? `${parentPath}/` : ''}${tag}${count > 1 ? `[${count}]` : ''}`;
    if (ns === undefined && prefix !== '') throw new ManifestShapeError(`${path}: prefix "${prefix}" is not bound to a namespace`);
    const qattrs: Record<string, string> = {};
    for (const [k, v] of Object.entries(attrs)) {
      if (k === 'xmlns' || k.startsWith('xmlns:')) continue;
      const c = k.indexOf(':');
      if (c < 0) {
        qattrs[k] = v;
        continue;
      }
      const p = k.slice(0, c);
      const uri = p === 'xml' ? NS.xml : inner[p];
      if (uri === undefined) throw new ManifestShapeError(`${path}: attribute prefix "${p}" is not bound to a namespace`);
      qattrs[`{${uri}}${k.slice(c + 1)}`] = v;
    }
    const body = (node[tag] as OrderedNode[]) ?? [];
    const text = body
      .filter((n) => '#text' in n)
      .map((n) => String(n['#text']))
      .join('');
    out.push({ ns: ns ?? '', local, attrs, qattrs, children: resolveTree(body, inner, path), text, path });
  }
  return out;
}

/** Parses XML into a namespace-resolved tree; throws with the parser's message when it is not well-formed. */
export function parseXml(xml: string): XmlElement {
  const valid = XMLValidator.validate(xml);
  if (valid !== true) throw new ManifestShapeError(`not well-formed XML: ${valid.err.msg} (line ${valid.err.line}, column ${valid.err.col})`);
  const roots = resolveTree(parser.parse(xml) as OrderedNode[], { xml: NS.xml }, '');
  if (roots.length !== 1) throw new ManifestShapeError(`expected one root element, found ${roots.length}`);
  return roots[0]!;
}

const xsiType = (e: XmlElement | undefined): string | undefined => e?.qattrs[`{${NS.xsi}}type`];
const childrenNamed = (e: XmlElement | undefined, local: string, ns?: string): XmlElement[] =>
  e ? e.children.filter((c) => c.local === local && (ns === undefined || c.ns === ns)) : [];
const child = (e: XmlElement | undefined, local: string, ns?: string): XmlElement | undefined => childrenNamed(e, local, ns)[0];
const descendants = (e: XmlElement): XmlElement[] => e.children.flatMap((c) => [c, ...descendants(c)]);

/** Collects check results; each check is one line of `npm run validate`. */
class Checklist {
  readonly results: Check[] = [];
  check(name: string, problems: readonly string[], passed = ''): void {
    this.results.push({ name, ok: problems.length === 0, detail: problems.length === 0 ? passed : problems.join('; ') });
  }
}

/** A URL-valued attribute of the manifest and where it was found. */
interface UrlUse {
  readonly where: string;
  readonly value: string;
}

/** Every place the schemas give a URL: the base manifest's URL settings, their overrides, bt:Image and bt:Url, AppDomain. */
function urlUses(root: XmlElement): UrlUse[] {
  const uses: UrlUse[] = [];
  const urlSettings = new Set(['IconUrl', 'HighResolutionIconUrl', 'SupportUrl']);
  for (const e of [root, ...descendants(root)]) {
    const baseSetting = e.ns === NS.officeApp && (urlSettings.has(e.local) || (e.local === 'SourceLocation' && e.path.includes('DefaultSettings')));
    const resource = e.ns === NS.basicTypes && (e.local === 'Image' || e.local === 'Url');
    if (baseSetting || resource) {
      if (e.attrs.DefaultValue !== undefined) uses.push({ where: `${e.path}@DefaultValue`, value: e.attrs.DefaultValue });
      for (const o of childrenNamed(e, 'Override')) if (o.attrs.Value !== undefined) uses.push({ where: `${o.path}@Value`, value: o.attrs.Value });
    }
    if (e.local === 'AppDomain') uses.push({ where: e.path, value: e.text });
  }
  return uses;
}

export interface ManifestOptions {
  /** The namespace the cell functions are published under (XFMR). */
  readonly namespace: string;
}

/** Runs every manifest check; never throws for a bad manifest, each fault is a failed check. */
export function checkManifest(xml: string, options: ManifestOptions): Check[] {
  const list = new Checklist();
  let root: XmlElement;
  try {
    root = parseXml(xml);
    list.check('manifest is well-formed XML with bound namespace prefixes', []);
  } catch (error) {
    if (!(error instanceof ManifestShapeError)) throw error;
    list.check('manifest is well-formed XML with bound namespace prefixes', [error.message]);
    return list.results;
  }

  list.check(
    `root element is OfficeApp in namespace ${NS.officeApp}`,
    root.local === 'OfficeApp' && root.ns === NS.officeApp ? [] : [`root is ${root.local} in namespace "${root.ns}"`],
  );
  list.check('root xsi:type is TaskPaneApp', xsiType(root) === 'TaskPaneApp' ? [] : [`xsi:type is "${xsiType(root) ?? '(none)'}"`]);

  // Schema order: every child known, none twice (each has maxOccurs 1), and in sequence.
  const order: readonly string[] = OFFICE_APP_ORDER;
  const orderProblems: string[] = [];
  let last = -1;
  const present = new Set<string>();
  for (const c of root.children) {
    const expectedNs = c.local === 'VersionOverrides' ? NS.versionOverrides : NS.officeApp;
    const at = order.indexOf(c.local);
    if (at < 0 || c.ns !== expectedNs) {
      orderProblems.push(`${c.path} (namespace "${c.ns}") is not a child the TaskPaneApp schema allows`);
      continue;
    }
    if (present.has(c.local)) orderProblems.push(`${c.local} appears more than once`);
    else if (at < last) orderProblems.push(`${c.local} comes after ${order[last]}; the schema puts it before`);
    present.add(c.local);
    last = Math.max(last, at);
  }
  const missing = OFFICE_APP_REQUIRED.filter((name) => !present.has(name));
  list.check(`required elements present: ${OFFICE_APP_REQUIRED.join(', ')}`, missing.map((m) => `<${m}> is missing`));
  list.check('OfficeApp children in schema order (Id, AlternateId?, Version, …, Permissions, Dictionary?, VersionOverrides)', orderProblems);

  const text = (local: string) => child(root, local, NS.officeApp)?.text ?? '';
  const id = text('Id');
  list.check('Id is a GUID', /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(id) ? [] : [`Id is "${id}"`], id);
  const version = text('Version');
  list.check('Version is n.n.n.n (each part at most 5 digits)', /^\d{1,5}(\.\d{1,5}){3}$/.test(version) ? [] : [`Version is "${version}"`], version);
  const locale = text('DefaultLocale');
  list.check('DefaultLocale is a culture name', /^[a-z]{2,3}(-[A-Za-z0-9]{2,8})*$/.test(locale) ? [] : [`DefaultLocale is "${locale}"`], locale);
  const lengthProblems: string[] = [];
  const shortMax = (local: string, value: string | undefined, max: number) => {
    if (!value) lengthProblems.push(`${local} is empty`);
    else if (value.length > max) lengthProblems.push(`${local} is ${value.length} characters, more than ${max}`);
  };
  shortMax('ProviderName', text('ProviderName'), 125);
  shortMax('DisplayName@DefaultValue', child(root, 'DisplayName', NS.officeApp)?.attrs.DefaultValue, 125);
  shortMax('Description@DefaultValue', child(root, 'Description', NS.officeApp)?.attrs.DefaultValue, 250);
  list.check('ProviderName and DisplayName 1–125 characters, Description 1–250', lengthProblems);

  const permissions = text('Permissions');
  list.check(
    `Permissions is one of ${PERMISSIONS.join(', ')}`,
    (PERMISSIONS as readonly string[]).includes(permissions) ? [] : [`Permissions is "${permissions}"`],
    permissions,
  );
  list.check(
    'Permissions is Restricted, the least level (custom functions call no document API)',
    permissions === 'Restricted' ? [] : [`Permissions is "${permissions}"; custom functions need only Restricted`],
  );

  const hosts = childrenNamed(child(root, 'Hosts', NS.officeApp), 'Host', NS.officeApp).map((h) => h.attrs.Name ?? '');
  list.check('Hosts is exactly Host Name="Workbook"', hosts.length === 1 && hosts[0] === 'Workbook' ? [] : [`Hosts are [${hosts.join(', ')}]`]);

  const sets = descendants(child(root, 'Requirements', NS.officeApp) ?? root).filter((e) => e.local === 'Set' && e.path.startsWith('OfficeApp/Requirements'));
  list.check(
    'Requirements name the CustomFunctionsRuntime set',
    sets.some((s) => s.attrs.Name === 'CustomFunctionsRuntime') ? [] : ['no <Set Name="CustomFunctionsRuntime"> under Requirements'],
  );
  list.check(
    'DefaultSettings has a SourceLocation',
    child(child(root, 'DefaultSettings', NS.officeApp), 'SourceLocation', NS.officeApp)?.attrs.DefaultValue ? [] : ['DefaultSettings/SourceLocation@DefaultValue is missing'],
  );

  // VersionOverrides: the custom-functions extension point and its resources.
  const vo = child(root, 'VersionOverrides', NS.versionOverrides);
  list.check('VersionOverrides xsi:type is VersionOverridesV1_0', xsiType(vo) === 'VersionOverridesV1_0' ? [] : [`xsi:type is "${xsiType(vo) ?? '(no VersionOverrides)'}"`]);
  const voHosts = childrenNamed(child(vo, 'Hosts', NS.versionOverrides), 'Host', NS.versionOverrides);
  const workbook = voHosts.find((h) => xsiType(h) === 'Workbook');
  list.check(
    'VersionOverrides hosts exactly xsi:type="Workbook"',
    voHosts.length === 1 && workbook ? [] : [`VersionOverrides hosts are [${voHosts.map((h) => xsiType(h) ?? '?').join(', ')}]`],
  );
  const points = childrenNamed(child(workbook, 'AllFormFactors', NS.versionOverrides), 'ExtensionPoint', NS.versionOverrides).filter(
    (p) => xsiType(p) === 'CustomFunctions',
  );
  const point = points[0];
  const cfParts = ['Script', 'Page', 'Metadata', 'Namespace'] as const;
  const partNames = point ? point.children.map((c) => c.local) : [];
  const pointProblems: string[] = [];
  if (points.length !== 1) pointProblems.push(`${points.length} CustomFunctions extension points under Host Workbook/AllFormFactors`);
  else if (partNames.join(',') !== cfParts.join(',')) pointProblems.push(`children are [${partNames.join(', ')}]`);
  list.check('a CustomFunctions ExtensionPoint with Script, Page, Metadata, Namespace (in that order)', pointProblems);

  // Resources: ids unique and ≤ 32 characters; every resid resolves to a resource of the right kind.
  const resources = child(vo, 'Resources', NS.versionOverrides);
  const kinds = { Images: 'Image', Urls: 'Url', ShortStrings: 'String', LongStrings: 'String' } as const;
  const byId = new Map<string, { kind: keyof typeof kinds; element: XmlElement }>();
  const idProblems: string[] = [];
  for (const [group, item] of Object.entries(kinds) as [keyof typeof kinds, string][]) {
    for (const e of childrenNamed(child(resources, group, NS.basicTypes), item, NS.basicTypes)) {
      const rid = e.attrs.id ?? '';
      if (rid.length === 0) idProblems.push(`${e.path} has no id`);
      else if (rid.length > MAX_RESOURCE_ID) idProblems.push(`resource id "${rid}" is ${rid.length} characters, more than ${MAX_RESOURCE_ID}`);
      if (byId.has(rid)) idProblems.push(`resource id "${rid}" is used twice`);
      byId.set(rid, { kind: group, element: e });
    }
  }
  list.check(`resource ids unique and 1–${MAX_RESOURCE_ID} characters`, idProblems, `${byId.size} resources`);

  const residProblems: string[] = [];
  const refs = [root, ...descendants(root)].filter((e) => e.attrs.resid !== undefined);
  const expectedKind = (e: XmlElement): keyof typeof kinds | undefined =>
    e.local === 'SourceLocation' ? 'Urls' : e.local === 'Namespace' ? 'ShortStrings' : undefined;
  for (const e of refs) {
    const rid = e.attrs.resid!;
    const target = byId.get(rid);
    if (rid.length > MAX_RESOURCE_ID) residProblems.push(`${e.path}: resid "${rid}" is ${rid.length} characters, more than ${MAX_RESOURCE_ID}`);
    if (!target) residProblems.push(`${e.path}: resid "${rid}" names no resource`);
    else if (expectedKind(e) && target.kind !== expectedKind(e)) residProblems.push(`${e.path}: resid "${rid}" is in ${target.kind}, expected ${expectedKind(e)}`);
  }
  list.check('every resid resolves to a resource of the right kind', residProblems, `${refs.length} references`);

  // URLs: HTTPS everywhere, at most 2048 characters, one origin (a deployment replaces it throughout).
  const uses = urlUses(root);
  const urlProblems: string[] = [];
  const origins = new Set<string>();
  for (const u of uses) {
    if (u.where.endsWith('AppDomain')) {
      if (!/^https:\/\//i.test(u.value)) urlProblems.push(`${u.where}: "${u.value}" is not https://`);
      continue;
    }
    let url: URL;
    try {
      url = new URL(u.value);
    } catch {
      urlProblems.push(`${u.where}: "${u.value}" is not an absolute URL`);
      continue;
    }
    if (url.protocol !== 'https:') urlProblems.push(`${u.where}: "${u.value}" is not HTTPS`);
    if (u.value.length > 2048) urlProblems.push(`${u.where}: longer than 2048 characters`);
    origins.add(url.origin);
  }
  // Anything else that looks like a plain-HTTP address (an attribute or text the list above missed).
  for (const e of [root, ...descendants(root)]) {
    for (const [k, v] of Object.entries(e.attrs)) {
      if (k !== 'xmlns' && !k.startsWith('xmlns:') && /^http:\/\//i.test(v) && !uses.some((u) => u.value === v)) urlProblems.push(`${e.path}@${k}: "${v}" is not HTTPS`);
    }
    if (/^http:\/\//i.test(e.text) && !uses.some((u) => u.value === e.text)) urlProblems.push(`${e.path}: "${e.text}" is not HTTPS`);
  }
  list.check('every URL is HTTPS', urlProblems, `${uses.length} URLs`);
  list.check('all URLs share one origin', origins.size <= 1 ? [] : [`origins: ${[...origins].join(', ')}`], [...origins].join(''));

  const resolveUrl = (part: 'Script' | 'Page' | 'Metadata'): string | undefined => {
    const rid = child(child(point, part, NS.versionOverrides), 'SourceLocation', NS.versionOverrides)?.attrs.resid;
    const target = rid === undefined ? undefined : byId.get(rid);
    return target?.kind === 'Urls' ? target.element.attrs.DefaultValue : undefined;
  };
  const endsIn = (part: 'Script' | 'Page' | 'Metadata', file: string) => {
    const url = resolveUrl(part);
    let pathname = '';
    try {
      pathname = url ? new URL(url).pathname : '';
    } catch {
      // reported by the URL check
    }
    list.check(`${part} URL ends in ${file}`, pathname.endsWith(`/${file}`) ? [] : [`${part} URL is "${url ?? '(unresolved)'}"`], url ?? '');
  };
  endsIn('Metadata', 'functions.json');
  endsIn('Script', 'functions.js');
  endsIn('Page', 'functions.html');

  const nsRid = child(point, 'Namespace', NS.versionOverrides)?.attrs.resid;
  const nsTarget = nsRid === undefined ? undefined : byId.get(nsRid);
  const nsValue = nsTarget?.element.attrs.DefaultValue;
  list.check(`custom-functions namespace is ${options.namespace}`, nsValue === options.namespace ? [] : [`namespace string is "${nsValue ?? '(unresolved)'}"`]);

  return list.results;
}

/** The URLs of the manifest that point at `origin`, as paths (for checking the build emits them). */
export function manifestPaths(xml: string, origin: string): string[] {
  const root = parseXml(xml);
  const paths = new Set<string>();
  for (const u of urlUses(root)) {
    try {
      const url = new URL(u.value);
      if (url.origin === origin) paths.add(url.pathname);
    } catch {
      // not a URL; reported by checkManifest
    }
  }
  return [...paths].sort();
}

const TYPES = ['boolean', 'number', 'string', 'any'];
const DIMENSIONALITIES = ['scalar', 'matrix'];

/** Checks functions.json (already parsed) the way Excel reads it. */
export function checkFunctionsJson(json: unknown): Check[] {
  const list = new Checklist();
  const functions = (json as { functions?: unknown })?.functions;
  if (!Array.isArray(functions) || functions.length === 0) {
    list.check('functions.json has a non-empty "functions" array', ['no functions array, or it is empty']);
    return list.results;
  }
  list.check('functions.json has a non-empty "functions" array', [], `${functions.length} functions`);
  const fs = functions as Record<string, unknown>[];
  const label = (f: Record<string, unknown>, i: number) => (typeof f.id === 'string' ? f.id : `functions[${i}]`);

  const seen = new Set<string>();
  const dupes = new Set<string>();
  for (const f of fs) {
    if (typeof f.id !== 'string') continue;
    const key = f.id.toUpperCase();
    if (seen.has(key)) dupes.add(f.id);
    seen.add(key);
  }
  list.check('function ids unique', [...dupes].map((d) => `"${d}" is used more than once`));
  list.check(
    'function ids upper-case [A-Z0-9._], starting with a letter',
    fs.flatMap((f, i) => (typeof f.id === 'string' && /^[A-Z][A-Z0-9._]*$/.test(f.id) ? [] : [`${label(f, i)}: id ${JSON.stringify(f.id)}`])),
  );
  list.check(
    'function name equals id',
    fs.flatMap((f, i) => (f.name === f.id ? [] : [`${label(f, i)}: name ${JSON.stringify(f.name)}`])),
  );
  list.check(
    'every function has a description',
    fs.flatMap((f, i) => (typeof f.description === 'string' && f.description.trim() !== '' ? [] : [`${label(f, i)}: no description`])),
  );

  const paramProblems: string[] = [];
  const orderProblems: string[] = [];
  for (const [i, f] of fs.entries()) {
    const params = f.parameters;
    if (params === undefined) continue;
    if (!Array.isArray(params)) {
      paramProblems.push(`${label(f, i)}: parameters is not an array`);
      continue;
    }
    const names = new Set<string>();
    let optionalSeen: string | undefined;
    let misordered = false;
    for (const [k, p] of (params as Record<string, unknown>[]).entries()) {
      const where = `${label(f, i)} parameter ${typeof p.name === 'string' ? p.name : k + 1}`;
      for (const field of ['name', 'description', 'type', 'dimensionality'] as const) {
        if (typeof p[field] !== 'string' || (p[field] as string).trim() === '') paramProblems.push(`${where}: no ${field}`);
      }
      if (typeof p.type === 'string' && !TYPES.includes(p.type)) paramProblems.push(`${where}: type "${p.type}" is not one of ${TYPES.join(', ')}`);
      if (typeof p.dimensionality === 'string' && !DIMENSIONALITIES.includes(p.dimensionality)) paramProblems.push(`${where}: dimensionality "${p.dimensionality}"`);
      if (typeof p.name === 'string') {
        if (names.has(p.name)) paramProblems.push(`${where}: name used twice`);
        names.add(p.name);
      }
      if (p.optional === true) optionalSeen ??= String(p.name);
      else if (optionalSeen !== undefined && !misordered) {
        orderProblems.push(`${label(f, i)}: required ${String(p.name)} follows optional ${optionalSeen}`);
        misordered = true; // one message per function is enough
      }
    }
  }
  list.check('every parameter has a name, description, type and dimensionality', paramProblems);
  list.check('optional parameters come only after required ones', orderProblems);
  list.check(
    'every result is typed (type and dimensionality)',
    fs.flatMap((f, i) => {
      const r = f.result as Record<string, unknown> | undefined;
      if (!r || typeof r !== 'object') return [`${label(f, i)}: no result`];
      const out: string[] = [];
      if (typeof r.type !== 'string' || !TYPES.includes(r.type)) out.push(`${label(f, i)}: result type ${JSON.stringify(r.type)}`);
      if (r.dimensionality !== undefined && !DIMENSIONALITIES.includes(r.dimensionality as string)) out.push(`${label(f, i)}: result dimensionality ${JSON.stringify(r.dimensionality)}`);
      return out;
    }),
  );
  return list.results;
}

/** One line per check, as `npm run validate` prints them. */
export function formatCheck(c: Check, scope: string): string {
  return `${c.ok ? 'ok  ' : 'FAIL'} ${scope}: ${c.name}${c.detail ? ` — ${c.detail}` : ''}`;
}
