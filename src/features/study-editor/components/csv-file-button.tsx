export type CsvFileButtonProps = { onText: (text: string, name: string) => void; onError: (message: string) => void };

/** Native builds take pasted text only; the web build also opens a file (csv-file-button.web.tsx). */
export function CsvFileButton(_props: CsvFileButtonProps) {
  return null;
}
