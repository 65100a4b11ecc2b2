import type { DefaultSections } from '@/core/study';

import { at, DOCUMENT } from './field-path';
import type { TeamDefault } from './editor-context';

/** The leaves of the team defaults a study was started with, by form field (`document.site.altitudeM`). */
export function teamDefaultFields(defaults: DefaultSections | null | undefined): Map<string, TeamDefault> {
  const out = new Map<string, TeamDefault>();
  const walk = (value: unknown, path: string) => {
    if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
      for (const [key, inner] of Object.entries(value)) walk(inner, at(path, key));
      return;
    }
    out.set(at(DOCUMENT, path), { value, source: defaults?.sources[path] ?? 'team setting' });
  };
  if (defaults) walk(defaults.document, '');
  return out;
}
