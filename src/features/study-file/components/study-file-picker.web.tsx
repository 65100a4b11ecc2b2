import { useRef, type ChangeEvent } from 'react';

import { Button } from '@/components/ui';

import type { PickedStudyFile } from '../types';

export type StudyFilePickerProps = { label: string; onPick: (file: PickedStudyFile) => void; disabled?: boolean };

/** A button that opens the browser's file chooser for a study file (JSON). */
export function StudyFilePicker({ label, onPick, disabled }: StudyFilePickerProps) {
  const input = useRef<HTMLInputElement>(null);
  const onChange = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    // Cleared so that choosing the same (corrected) file again still fires a change.
    event.target.value = '';
    if (file) onPick({ name: file.name, size: file.size, read: () => file.text() });
  };
  return (
    <>
      <Button label={label} variant="secondary" disabled={disabled} onPress={() => input.current?.click()} />
      <input
        ref={input}
        type="file"
        accept=".json,application/json"
        aria-label={label}
        data-testid="study-file-input"
        onChange={onChange}
        style={{ display: 'none' }}
      />
    </>
  );
}
