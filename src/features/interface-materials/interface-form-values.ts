import { numberOrNull, textOf } from '@/features/catalogues/form-values';

import type { InterfaceMaterial } from './types';

export type InterfaceFormValues = {
  name: string;
  kind: InterfaceMaterial['kind'];
  packageName: string;
  rthKPerW: string;
  conductivityWPerMK: string;
  thicknessMm: string;
  contactKCm2PerW: string;
  notes: string;
};

export const emptyInterfaceValues = (): InterfaceFormValues => ({
  name: '',
  kind: 'per_package',
  packageName: '',
  rthKPerW: '',
  conductivityWPerMK: '',
  thicknessMm: '',
  contactKCm2PerW: '',
  notes: '',
});

export const interfaceValues = (m: InterfaceMaterial): InterfaceFormValues => ({
  name: m.name,
  kind: m.kind,
  packageName: m.packageName ?? '',
  rthKPerW: textOf(m.rthKPerW),
  conductivityWPerMK: textOf(m.conductivityWPerMK),
  thicknessMm: textOf(m.thicknessMm),
  contactKCm2PerW: textOf(m.contactKCm2PerW),
  notes: m.notes,
});

/** The API body; the values of the other kind are dropped so they cannot linger unseen. */
export function interfaceInput(v: InterfaceFormValues): Record<string, unknown> {
  const perPackage = v.kind === 'per_package';
  return {
    name: v.name,
    kind: v.kind,
    packageName: perPackage && v.packageName.trim() !== '' ? v.packageName : null,
    rthKPerW: perPackage ? numberOrNull(v.rthKPerW) : null,
    conductivityWPerMK: perPackage ? null : numberOrNull(v.conductivityWPerMK),
    thicknessMm: perPackage ? null : numberOrNull(v.thicknessMm),
    contactKCm2PerW: perPackage ? null : numberOrNull(v.contactKCm2PerW),
    notes: v.notes,
  };
}
