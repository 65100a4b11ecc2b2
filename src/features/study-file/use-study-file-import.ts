import { useState } from 'react';

import { errorMessage } from '@/api';
import { useCreateStudy } from '@/features/studies/api';
import type { Study } from '@/features/studies/types';

import { checkStudyFileSize, readStudyFile, type StudyFileCheck } from './read-study-file';
import type { PickedStudyFile } from './types';

export type StudyFileImportState =
  | { kind: 'idle' }
  | { kind: 'reading'; fileName: string }
  | { kind: 'checked'; fileName: string; check: StudyFileCheck };

export type StudyFileImport = {
  state: StudyFileImportState;
  pick: (file: PickedStudyFile) => void;
  /** Creates the study from a file that passed the check. */
  create: () => void;
  creating: boolean;
  /** Why the server refused to create it, if it did. */
  createError: string | null;
  close: () => void;
};

/**
 * Import of a study file into a team: read and check it in the browser first (nothing is
 * sent for a file that fails), then create the study from it on request.
 */
export function useStudyFileImport(teamId: number | undefined, onCreated: (study: Study) => void): StudyFileImport {
  const [state, setState] = useState<StudyFileImportState>({ kind: 'idle' });
  const create = useCreateStudy();

  const pick = (file: PickedStudyFile) => {
    create.reset();
    const tooLarge = checkStudyFileSize(file.size);
    if (tooLarge) {
      setState({ kind: 'checked', fileName: file.name, check: tooLarge });
      return;
    }
    setState({ kind: 'reading', fileName: file.name });
    file.read().then(
      (text) => setState({ kind: 'checked', fileName: file.name, check: readStudyFile(text) }),
      (error: unknown) =>
        setState({
          kind: 'checked',
          fileName: file.name,
          check: { kind: 'refused', message: `The file could not be read: ${error instanceof Error ? error.message : String(error)}` },
        }),
    );
  };

  const createStudy = () => {
    if (state.kind !== 'checked' || state.check.kind !== 'ok') return;
    const { title, description, document } = state.check;
    create.mutate(
      { title, description, document, teamId },
      {
        onSuccess: (study) => {
          setState({ kind: 'idle' });
          onCreated(study);
        },
      },
    );
  };

  return {
    state,
    pick,
    create: createStudy,
    creating: create.isPending,
    createError: create.isError ? errorMessage(create.error) : null,
    close: () => {
      create.reset();
      setState({ kind: 'idle' });
    },
  };
}
