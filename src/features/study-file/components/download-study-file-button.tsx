import { useState } from 'react';

import { Button, InlineAlert, saveTextFile } from '@/components/ui';
import type { Study } from '@/features/studies/types';

import { hasDocument, studyFileName, studyFileText } from '../study-file';

export type DownloadStudyFileButtonProps = { study: Pick<Study, 'title' | 'description' | 'document'>; label?: string };

/** Saves the study as a study file (docs/study-format.md), named after its title. */
export function DownloadStudyFileButton({ study, label = 'Download study file' }: DownloadStudyFileButtonProps) {
  const [error, setError] = useState<string | null>(null);
  const download = async () => {
    setError(null);
    try {
      await saveTextFile(studyFileName(study.title), studyFileText(study), 'application/json');
    } catch (failure) {
      setError(`The study file could not be saved: ${failure instanceof Error ? failure.message : String(failure)}`);
    }
  };
  return (
    <>
      <Button
        label={label}
        variant="secondary"
        onPress={download}
        disabled={!hasDocument(study)}
        accessibilityHint={hasDocument(study) ? undefined : 'The study has no design inputs to save yet.'}
      />
      {error ? <InlineAlert message={error} /> : null}
    </>
  );
}
