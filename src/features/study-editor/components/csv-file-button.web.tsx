import { useRef } from 'react';

import { Button } from '@/components/ui';

export type CsvFileButtonProps = { onText: (text: string, name: string) => void; onError: (message: string) => void };

/** Largest log read in the browser; a bigger one would make more segments than anyone can read. */
const MAX_BYTES = 4 * 1024 * 1024;

/** Opens a CSV file from the computer and hands over its text. */
export function CsvFileButton({ onText, onError }: CsvFileButtonProps) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <input
        ref={input}
        type="file"
        accept=".csv,.txt,text/csv,text/plain"
        style={{ display: 'none' }}
        aria-label="CSV file"
        onChange={async (e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (!file) return;
          if (file.size > MAX_BYTES) {
            onError(`${file.name} is larger than ${MAX_BYTES / 1024 / 1024} MiB.`);
            return;
          }
          try {
            onText(await file.text(), file.name);
          } catch (error) {
            onError(`${file.name} could not be read: ${error instanceof Error ? error.message : String(error)}`);
          }
        }}
      />
      <Button label="Choose a CSV file" variant="secondary" onPress={() => input.current?.click()} />
    </>
  );
}
