import { createContext, useContext, useEffect, type ReactNode } from 'react';

import type { FieldKind } from './quantity-text';

/** A field on screen: its label for the problem list, and how its text is read. */
export type FieldMeta = { label: string; kind?: FieldKind };

export type EditorActions = {
  /** Sets one form field (`document.devices[0].tjMaxC`); `undefined` removes it. */
  set: (field: string, value: unknown) => void;
  /** Replaces a field with a function of its current value (list edits). */
  update: <T>(field: string, change: (current: T) => T) => void;
  register: (field: string, meta: FieldMeta) => () => void;
};

/** A value the study took from its team's defaults when it was started, by form field. */
export type TeamDefault = { value: unknown; source: string };

const ActionsContext = createContext<EditorActions | null>(null);
const ErrorsContext = createContext<ReadonlyMap<string, string>>(new Map());
const DefaultsContext = createContext<ReadonlyMap<string, TeamDefault>>(new Map());

export function EditorProvider({
  actions,
  errors,
  defaults = new Map(),
  children,
}: {
  actions: EditorActions;
  errors: ReadonlyMap<string, string>;
  defaults?: ReadonlyMap<string, TeamDefault>;
  children: ReactNode;
}) {
  return (
    <ActionsContext.Provider value={actions}>
      <ErrorsContext.Provider value={errors}>
        <DefaultsContext.Provider value={defaults}>{children}</DefaultsContext.Provider>
      </ErrorsContext.Provider>
    </ActionsContext.Provider>
  );
}

/** "From team defaults (source)" while the field still holds the value it took from them. */
export function useTeamDefaultNote(field: string, value: unknown): string | undefined {
  const d = useContext(DefaultsContext).get(field);
  return d && d.value === value ? `From team defaults (${d.source})` : undefined;
}

/** Every value the study took from its team's defaults, with the field it sits in. */
export function useTeamDefaults(): ReadonlyMap<string, TeamDefault> {
  return useContext(DefaultsContext);
}

export function useEditorActions(): EditorActions {
  const actions = useContext(ActionsContext);
  if (!actions) throw new Error('useEditorActions used outside the study editor');
  return actions;
}

/** The problem reported at exactly this field, if any. */
export function useFieldError(field: string): string | undefined {
  return useContext(ErrorsContext).get(field);
}

/** Names the field in the problem list while it is on screen. */
export function useRegisterField(field: string, label: string, kind?: FieldKind): void {
  const { register } = useEditorActions();
  useEffect(() => register(field, { label, kind }), [register, field, label, kind]);
}

/** Problems at this field or anywhere inside it, for parts shown read-only (an SOA model, a rail plan). */
export function useErrorsUnder(prefix: string): { field: string; reason: string }[] {
  const errors = useContext(ErrorsContext);
  const out: { field: string; reason: string }[] = [];
  for (const [field, reason] of errors) {
    if (field === prefix || field.startsWith(`${prefix}.`) || field.startsWith(`${prefix}[`)) out.push({ field, reason });
  }
  return out;
}
