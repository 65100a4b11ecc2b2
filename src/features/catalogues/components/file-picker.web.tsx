import { useRef, type ChangeEvent } from 'react';

import { Button } from '@/components/ui';

import type { PickedFile } from '../types';

export type FilePickerProps = { label: string; onPick: (file: PickedFile) => void; disabled?: boolean };

/** A button that opens the browser's file chooser for a CSV file. */
export function FilePicker({ label, onPick, disabled }: FilePickerProps) {
  const input = useRef<HTMLInputElement>(null);
  const onChange = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    // Cleared so that choosing the same (corrected) file again still fires a change.
    event.target.value = '';
    if (file) onPick({ name: file.name, size: file.size, blob: file });
  };
  return (
    <>
      <Button label={label} variant="secondary" disabled={disabled} onPress={() => input.current?.click()} />
      <input
        ref={input}
        type="file"
        accept=".csv,.tsv,.txt,text/csv,text/plain"
        aria-label={label}
        onChange={onChange}
        style={{ display: 'none' }}
      />
    </>
  );
}
