/**
 * Field paths as the study parser writes them (`devices[1].package.terms[0].tauS`). The form
 * holds the document under `document.`, so a parser path, a server path
 * (`document.devices[0].sink`) and a form field name are the same string once prefixed.
 */
export const at = (base: string, key: string | number): string =>
  typeof key === 'number' ? `${base}[${key}]` : base ? `${base}.${key}` : key;

export const DOCUMENT = 'document';

/** Form field name of a document path (`ambient.temperatureC` → `document.ambient.temperatureC`). */
export const inDocument = (path: string): string => (path ? at(DOCUMENT, path) : DOCUMENT);

export type SectionKey = 'study' | 'devices' | 'thermal' | 'ambient' | 'rails' | 'profile' | 'site';

export const SECTION_TITLES: Record<SectionKey, string> = {
  study: 'Study and margin',
  devices: 'Pass elements',
  thermal: 'Thermal path',
  ambient: 'Ambient',
  rails: 'Rail plan',
  profile: 'Load profile',
  site: 'Site, life and touch',
};

export const SECTION_ORDER: readonly SectionKey[] = ['study', 'devices', 'thermal', 'ambient', 'rails', 'profile', 'site'];

/** The editor section a form field belongs to. */
export function sectionOf(field: string): SectionKey {
  const rest = field.startsWith(`${DOCUMENT}.`) ? field.slice(DOCUMENT.length + 1) : field;
  const head = /^[A-Za-z]+/.exec(rest)?.[0] ?? '';
  if (head === 'devices') return 'devices';
  if (head === 'sinks' || head === 'enclosure') return 'thermal';
  if (head === 'ambient') return 'ambient';
  if (head === 'railPlan') return 'rails';
  if (head === 'profile') return 'profile';
  if (head === 'site' || head === 'lifetime' || head === 'touch') return 'site';
  return 'study';
}
